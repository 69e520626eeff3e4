import type { MyMembershipView } from '@jarday/contracts';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { orchardKitchen } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { ReminderSwitch } from './reminder-switch';

const mePath = `/api/kitchens/${orchardKitchen.id}/members/me`;
const me = (over: Partial<MyMembershipView> = {}): MyMembershipView => ({
  kitchenId: orchardKitchen.id,
  userId: '0b6d2c4e-1f3a-4b5c-9d8e-7f6a5b4c3d2e',
  role: 'helper',
  reminders: true,
  ...over,
});

describe('ReminderSwitch', () => {
  it('shows my choice and turns reminders off with a PATCH of members/me', async () => {
    const stub = stubFetch({
      [`GET ${mePath}`]: { status: 200, body: me() },
      [`PATCH ${mePath}`]: { status: 200, body: me({ reminders: false }) },
    });
    const { user } = renderWithProviders(<ReminderSwitch kitchenId={orchardKitchen.id} />);

    const toggle = await screen.findByRole('switch', { name: 'E-mail me reminders' });
    expect((toggle as HTMLInputElement).checked).toBe(true);
    await user.click(toggle);

    await waitFor(() => expect((toggle as HTMLInputElement).checked).toBe(false));
    expect(stub.to(`PATCH ${mePath}`)[0]?.body).toEqual({ reminders: false });
  });

  it('tells a watcher that reminders go to leads and helpers', async () => {
    stubFetch({ [`GET ${mePath}`]: { status: 200, body: me({ role: 'watcher', reminders: false }) } });
    renderWithProviders(<ReminderSwitch kitchenId={orchardKitchen.id} />);
    expect(await screen.findByText(/Reminders go to leads and helpers/)).toBeTruthy();
  });

  it('shows a refused change as an error and keeps the choice as it was', async () => {
    stubFetch({
      [`GET ${mePath}`]: { status: 200, body: me() },
      [`PATCH ${mePath}`]: { status: 404, body: errorBody(404, 'not_found', 'Kitchen not found') },
    });
    const { user } = renderWithProviders(<ReminderSwitch kitchenId={orchardKitchen.id} />);
    const toggle = await screen.findByRole('switch', { name: 'E-mail me reminders' });
    await user.click(toggle);
    expect((await screen.findByRole('alert')).textContent).toContain('Kitchen not found');
    expect((toggle as HTMLInputElement).checked).toBe(true);
  });
});
