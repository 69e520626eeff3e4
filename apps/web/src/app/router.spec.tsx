import type { InvitePreview, KitchenView } from '@jarday/contracts';
import { ThemeProvider } from '@mui/material/styles';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { useSessionStore } from '../features/auth/stores/session-store';
import { bindSessionToApiClient } from '../features/auth/utils/session';
import { stubFetch } from '../testing/fetch-stub';
import { ada, canner, orchardKitchen, sessionFor } from '../testing/fixtures';
import { createRoutes } from './router';
import { theme } from './theme';

function renderApp(path: string) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [path] });
  render(
    <ThemeProvider theme={theme}>
      <QueryClientProvider client={queryClient}>
        <RouterProvider router={router} />
      </QueryClientProvider>
    </ThemeProvider>,
  );
  return { router, user: userEvent.setup() };
}

const signedOut = () => useSessionStore.getState().clear();
const signedIn = () => useSessionStore.getState().setSession(sessionFor(ada));
const noDemo = { status: 200, body: { demoMode: false, accounts: [] } };
const kitchenPath = `/api/kitchens/${orchardKitchen.id}`;

describe('routes', () => {
  let unbind: () => void;
  beforeEach(() => {
    unbind = bindSessionToApiClient();
  });
  afterEach(() => unbind());

  it('sends a signed-out person to sign-in, keeping where they were going', async () => {
    signedOut();
    stubFetch({ 'GET /api/auth/demo-accounts': noDemo });
    const { router } = renderApp(`/kitchens/${orchardKitchen.id}/members`);

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent(`/kitchens/${orchardKitchen.id}/members`)}`);
  });

  it('goes to sign-in, keeping the page, when the session has ended on the server', async () => {
    useSessionStore.getState().setSession(sessionFor(ada, 'stale-token'));
    const ended = { status: 401, body: { statusCode: 401, code: 'session_expired', message: 'Sign in again.' } };
    const stub = stubFetch({
      'GET /api/kitchens': ended,
      'POST /api/auth/refresh': ended,
      'GET /api/auth/demo-accounts': noDemo,
    });
    const { router } = renderApp('/kitchens');

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeTruthy();
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/kitchens')}`);
    expect(stub.to('POST /api/auth/refresh')).toHaveLength(1);
  });

  it('signs out from the account menu to a plain sign-in page', async () => {
    signedIn();
    const stub = stubFetch({
      'GET /api/kitchens': { status: 200, body: [orchardKitchen] },
      'POST /api/auth/sign-out': { status: 204 },
      'GET /api/auth/demo-accounts': noDemo,
    });
    const { router, user } = renderApp('/kitchens');

    await screen.findByRole('link', { name: new RegExp(orchardKitchen.name) });
    await user.click(screen.getByRole('button', { name: `Account: ${ada.name}` }));
    await user.click(screen.getByRole('menuitem', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeTruthy();
    expect(router.state.location.search).toBe('');
    expect(stub.to('POST /api/auth/sign-out')[0]?.credentials).toBe('include');
    expect(useSessionStore.getState().accessToken).toBeNull();
  });

  it('offers sign-in and registration on an invite link, both coming back to it', async () => {
    signedOut();
    stubFetch({});
    renderApp('/join/k7qm-3rtx');

    await screen.findByRole('heading', { level: 1, name: 'Join a kitchen' });
    const back = `?next=${encodeURIComponent('/join/K7QM3RTX')}`;
    expect(screen.getByRole('link', { name: 'Sign in' }).getAttribute('href')).toBe(`/sign-in${back}`);
    expect(screen.getByRole('link', { name: 'Create an account' }).getAttribute('href')).toBe(`/register${back}`);
  });

  it('lets a signed-in person preview an invite and join, then opens the kitchen', async () => {
    signedIn();
    const joined: KitchenView = { ...orchardKitchen, role: 'helper', memberCount: 4 };
    const preview: InvitePreview = {
      kitchenId: orchardKitchen.id,
      kitchenName: orchardKitchen.name,
      role: 'helper',
      expiresAt: '2025-08-10T10:00:00.000Z',
      alreadyMember: false,
    };
    const stub = stubFetch({
      'GET /api/invites/K7QM3RTX': { status: 200, body: preview },
      'POST /api/invites/K7QM3RTX/redeem': { status: 200, body: joined },
      [`GET ${kitchenPath}`]: { status: 200, body: joined },
    });
    const { router, user } = renderApp('/join/K7QM-3RTX');

    await user.click(await screen.findByRole('button', { name: `Join ${orchardKitchen.name} as helper` }));

    expect(await screen.findByRole('heading', { level: 1, name: orchardKitchen.name })).toBeTruthy();
    expect(router.state.location.pathname).toBe(`/kitchens/${orchardKitchen.id}`);
    expect(stub.to('POST /api/invites/K7QM3RTX/redeem')[0]?.headers.Authorization).toBe('Bearer access-token-1');
    expect(screen.getByRole('link', { name: /Members & invites/ })).toBeTruthy();
    expect(screen.getByRole('link', { name: /Settings & canners/ })).toBeTruthy();
  });

  it("shows a helper the kitchen's settings and canners without the lead's controls", async () => {
    signedIn();
    const asHelper: KitchenView = { ...orchardKitchen, role: 'helper' };
    const dial = canner({ name: 'Steel pressure canner', method: 'pressure', gauge: 'dial' });
    stubFetch({
      [`GET ${kitchenPath}`]: { status: 200, body: asHelper },
      [`GET ${kitchenPath}/canners`]: { status: 200, body: [dial] },
    });
    renderApp(`/kitchens/${orchardKitchen.id}/settings`);

    expect(await screen.findByRole('heading', { level: 3, name: 'Steel pressure canner' })).toBeTruthy();
    expect(screen.getByText('Altitude changes process times')).toBeTruthy();
    expect(screen.getByText('Check the dial gauge every year')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Save settings' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Add a canner' })).toBeNull();
    expect(screen.queryByRole('button', { name: /^Edit / })).toBeNull();
  });

  it('lets a lead change the kitchen settings', async () => {
    signedIn();
    const updated: KitchenView = { ...orchardKitchen, altitude: { value: 400, unit: 'm' } };
    const stub = stubFetch({
      [`GET ${kitchenPath}`]: { status: 200, body: orchardKitchen },
      [`GET ${kitchenPath}/canners`]: { status: 200, body: [] },
      [`PATCH ${kitchenPath}`]: { status: 200, body: updated },
      'GET /api/kitchens': { status: 200, body: [updated] },
    });
    const { user } = renderApp(`/kitchens/${orchardKitchen.id}/settings`);

    const altitude = await screen.findByLabelText('Altitude');
    await user.clear(altitude);
    await user.type(altitude, '400');
    await user.click(screen.getByRole('button', { name: 'Metres' }));
    await user.click(screen.getByRole('button', { name: 'Save settings' }));

    expect(await screen.findByText('Settings saved.')).toBeTruthy();
    await waitFor(() => expect(stub.to(`PATCH ${kitchenPath}`)).toHaveLength(1));
    expect(stub.to(`PATCH ${kitchenPath}`)[0]?.body).toEqual({
      name: orchardKitchen.name,
      altitude: { value: 400, unit: 'm' },
      units: 'us',
    });
  });
});
