import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { ada, member, orchardKitchen } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { MemberList } from './member-list';

const membersPath = `/api/kitchens/${orchardKitchen.id}/members`;
const tomas = member({
  userId: '7e6d5c4b-3a29-4180-9f7e-6d5c4b3a2918',
  name: 'Tomas Berg',
  email: 'tomas@example.test',
  role: 'helper',
});
const lina = member({
  userId: '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d',
  name: 'Lina Park',
  email: 'lina@example.test',
  role: 'watcher',
});
const everyone = [member(), tomas, lina];

const renderList = (props: { currentUserId: string; canManage: boolean }) => {
  const onLeft = vi.fn();
  const r = renderWithProviders(
    <MemberList kitchenId={orchardKitchen.id} kitchenName={orchardKitchen.name} onLeft={onLeft} {...props} />,
  );
  return { ...r, onLeft };
};

describe('MemberList', () => {
  it('gives a lead a role picker and a remove button per member', async () => {
    const stub = stubFetch({
      [`GET ${membersPath}`]: { status: 200, body: everyone },
      [`PATCH ${membersPath}/${tomas.userId}`]: { status: 200, body: { ...tomas, role: 'watcher' } },
    });
    const { user } = renderList({ currentUserId: ada.id, canManage: true });

    const picker = await screen.findByLabelText('Role for Tomas Berg');
    await user.selectOptions(picker, 'watcher');

    await waitFor(() => expect(stub.to(`PATCH ${membersPath}/${tomas.userId}`)).toHaveLength(1));
    expect(stub.to(`PATCH ${membersPath}/${tomas.userId}`)[0]?.body).toEqual({ role: 'watcher' });
    expect(screen.getByRole('button', { name: 'Remove Lina Park' })).toBeTruthy();
  });

  it('shows a helper no role pickers and no remove buttons, only "Leave kitchen"', async () => {
    stubFetch({ [`GET ${membersPath}`]: { status: 200, body: everyone } });
    renderList({ currentUserId: tomas.userId, canManage: false });

    await screen.findByText('Tomas Berg (you)');
    expect(screen.queryByRole('combobox')).toBeNull();
    expect(screen.queryByRole('button', { name: /^Remove/ })).toBeNull();
    expect(screen.getAllByRole('button', { name: 'Leave kitchen' })).toHaveLength(1);
  });

  it('lets a member leave, and tells the last lead why they cannot', async () => {
    const stub = stubFetch({
      [`GET ${membersPath}`]: { status: 200, body: everyone },
      [`DELETE ${membersPath}/${ada.id}`]: {
        status: 409,
        body: errorBody(409, 'last_lead', 'A kitchen needs at least one lead. Make someone else lead first.'),
      },
      [`DELETE ${membersPath}/${tomas.userId}`]: { status: 204 },
    });
    const first = renderList({ currentUserId: ada.id, canManage: true });

    await first.user.click(await screen.findByRole('button', { name: 'Leave kitchen' }));
    const dialog = screen.getByRole('dialog', { name: `Leave ${orchardKitchen.name}?` });
    await first.user.click(within(dialog).getByRole('button', { name: 'Leave kitchen' }));

    await waitFor(() => expect(within(dialog).getByRole('alert').textContent).toContain('at least one lead'));
    expect(first.onLeft).not.toHaveBeenCalled();
    first.unmount();

    const second = renderList({ currentUserId: tomas.userId, canManage: false });
    await second.user.click(await screen.findByRole('button', { name: 'Leave kitchen' }));
    await second.user.click(
      within(screen.getByRole('dialog', { name: `Leave ${orchardKitchen.name}?` })).getByRole('button', {
        name: 'Leave kitchen',
      }),
    );
    await waitFor(() => expect(second.onLeft).toHaveBeenCalledTimes(1));
    expect(stub.to(`DELETE ${membersPath}/${tomas.userId}`)).toHaveLength(1);
  });
});
