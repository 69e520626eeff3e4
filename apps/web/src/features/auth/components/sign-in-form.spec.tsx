import type { DemoAccount } from '@jarday/contracts';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { expectFieldError } from '../../../testing/assertions';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { ada, sessionFor } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { SignInForm } from './sign-in-form';

const demoAccounts: DemoAccount[] = [
  { email: 'lead@demo.jarday.test', password: 'demo-lead-pass-1', name: 'Rosa Lind', role: 'lead' },
  { email: 'helper@demo.jarday.test', password: 'demo-helper-pass-1', name: 'Tomas Berg', role: 'helper' },
];

const noDemo = { status: 200, body: { demoMode: false, accounts: [] } };

describe('SignInForm', () => {
  it('shows a refused sign-in (401) as a general error, not on a field', async () => {
    const stub = stubFetch({
      'GET /api/auth/demo-accounts': noDemo,
      'POST /api/auth/sign-in': {
        status: 401,
        body: errorBody(401, 'invalid_credentials', 'The e-mail or password is not right.'),
      },
    });
    const onSignedIn = vi.fn();
    const { user } = renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);

    await user.type(screen.getByLabelText('E-mail'), 'ada.fenwick@example.test');
    await user.type(screen.getByLabelText('Password'), 'not-my-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The e-mail or password is not right.');
    expect(screen.getByLabelText('E-mail').getAttribute('aria-invalid')).not.toBe('true');
    expect(stub.to('POST /api/auth/sign-in')[0]).toMatchObject({
      body: { email: 'ada.fenwick@example.test', password: 'not-my-password' },
      credentials: 'include',
    });
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('checks the fields with the shared schema before sending', async () => {
    const stub = stubFetch({ 'GET /api/auth/demo-accounts': noDemo });
    const { user } = renderWithProviders(<SignInForm onSignedIn={vi.fn()} />);

    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expectFieldError(screen.getByLabelText('E-mail'), 'Enter a valid e-mail address');
    expectFieldError(screen.getByLabelText('Password'), 'Password is required');
    expect(stub.to('POST /api/auth/sign-in')).toHaveLength(0);
  });

  it('lists demo accounts in demo mode; tapping one fills the form, which then signs in', async () => {
    const session = sessionFor(ada);
    const stub = stubFetch({
      'GET /api/auth/demo-accounts': { status: 200, body: { demoMode: true, accounts: demoAccounts } },
      'POST /api/auth/sign-in': { status: 200, body: session },
    });
    const onSignedIn = vi.fn();
    const { user } = renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);

    await user.click(await screen.findByRole('button', { name: 'Use demo account Tomas Berg (helper)' }));
    expect(screen.getByLabelText<HTMLInputElement>('E-mail').value).toBe('helper@demo.jarday.test');
    expect(screen.getByLabelText<HTMLInputElement>('Password').value).toBe('demo-helper-pass-1');

    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(session));
    expect(stub.to('POST /api/auth/sign-in')[0]?.body).toEqual({
      email: 'helper@demo.jarday.test',
      password: 'demo-helper-pass-1',
    });
  });

  it('lists no demo accounts outside demo mode', async () => {
    const stub = stubFetch({ 'GET /api/auth/demo-accounts': noDemo });
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />);

    await waitFor(() => expect(stub.to('GET /api/auth/demo-accounts')).toHaveLength(1));
    expect(screen.queryByRole('heading', { name: 'Demo accounts' })).toBeNull();
    expect(screen.queryByRole('button', { name: /demo account/ })).toBeNull();
  });
});
