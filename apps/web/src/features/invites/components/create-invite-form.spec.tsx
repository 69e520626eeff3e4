import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { invite, orchardKitchen } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { CreateInviteForm } from './create-invite-form';

const invitesPath = `/api/kitchens/${orchardKitchen.id}/invites`;

describe('CreateInviteForm', () => {
  it('creates an invite and shows its code large, with the join link and a copy button', async () => {
    const created = invite({ code: 'K7QM-3RTX', role: 'watcher' });
    const stub = stubFetch({
      [`POST ${invitesPath}`]: { status: 201, body: created },
      [`GET ${invitesPath}`]: { status: 200, body: [created] },
    });
    const { user } = renderWithProviders(<CreateInviteForm kitchenId={orchardKitchen.id} />);
    const writeText = vi.fn().mockResolvedValue(undefined);
    Object.defineProperty(navigator, 'clipboard', { value: { writeText }, configurable: true });

    await user.selectOptions(screen.getByLabelText('Invite as'), 'watcher');
    await user.selectOptions(screen.getByLabelText('Works for'), '14');
    await user.click(screen.getByRole('button', { name: 'Create invite' }));

    const code = await screen.findByTestId('invite-code');
    expect(code.textContent).toBe('K7QM-3RTX');
    expect(stub.to(`POST ${invitesPath}`)[0]?.body).toEqual({ role: 'watcher', expiresInDays: 14 });

    const link = `${window.location.origin}/join/K7QM3RTX`;
    expect(screen.getByLabelText<HTMLInputElement>('Invite link').value).toBe(link);

    await user.click(screen.getByRole('button', { name: 'Copy link' }));
    expect(writeText).toHaveBeenCalledWith(link);
    expect(within(await screen.findByRole('status')).getByText(/Link copied/)).toBeTruthy();
  });

  it('shows a refused request as an error and no code', async () => {
    stubFetch({
      [`POST ${invitesPath}`]: { status: 403, body: errorBody(403, 'forbidden', 'Only a lead can invite people.') },
    });
    const { user } = renderWithProviders(<CreateInviteForm kitchenId={orchardKitchen.id} />);

    await user.click(screen.getByRole('button', { name: 'Create invite' }));

    await waitFor(() => expect(screen.getByRole('alert').textContent).toContain('Only a lead can invite people.'));
    expect(screen.queryByTestId('invite-code')).toBeNull();
  });

  it('sends the e-mail address with the invite and says whom the link went to', async () => {
    const created = { ...invite({ code: 'K7QM-3RTX' }), emailedTo: 'sam@example.test' };
    const stub = stubFetch({
      [`POST ${invitesPath}`]: { status: 201, body: created },
      [`GET ${invitesPath}`]: { status: 200, body: [created] },
    });
    const { user } = renderWithProviders(<CreateInviteForm kitchenId={orchardKitchen.id} />);

    await user.type(screen.getByLabelText('E-mail the link to (optional)'), 'Sam@Example.test');
    await user.click(screen.getByRole('button', { name: 'Create invite' }));

    expect((await screen.findByTestId('invite-emailed')).textContent).toContain('on its way to sam@example.test');
    expect(stub.to(`POST ${invitesPath}`)[0]?.body).toEqual({
      role: 'helper',
      expiresInDays: 7,
      email: 'sam@example.test',
    });
    expect(screen.getByLabelText<HTMLInputElement>('E-mail the link to (optional)').value).toBe('');
  });

  it('refuses a bad address at the field without asking the server', async () => {
    const stub = stubFetch({});
    const { user } = renderWithProviders(<CreateInviteForm kitchenId={orchardKitchen.id} />);

    await user.type(screen.getByLabelText('E-mail the link to (optional)'), 'sam at home');
    await user.click(screen.getByRole('button', { name: 'Create invite' }));

    expect(await screen.findByText('Enter a valid e-mail address')).toBeTruthy();
    expect(stub.requests).toHaveLength(0);
  });
});
