import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { expectFieldError, expectFieldValid } from '../../../testing/assertions';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { ada, sessionFor } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { useSessionStore } from '../stores/session-store';
import { RegisterForm } from './register-form';

const fields = () => ({
  name: screen.getByLabelText('Your name'),
  email: screen.getByLabelText('E-mail'),
  password: screen.getByLabelText('Password'),
  submit: screen.getByRole('button', { name: 'Create account' }),
});

describe('RegisterForm', () => {
  it("shows the shared schema's messages inline and sends nothing", async () => {
    const stub = stubFetch({});
    const { user } = renderWithProviders(<RegisterForm onRegistered={vi.fn()} />);
    const f = fields();

    await user.type(f.email, 'not-an-address');
    await user.type(f.password, 'short');
    await user.click(f.submit);

    expectFieldError(f.name, 'Name is required');
    expectFieldError(f.email, 'Enter a valid e-mail address');
    expectFieldError(f.password, 'Use at least 10 characters');
    expect(stub.requests).toHaveLength(0);
  });

  it('registers with the parsed body and keeps the session', async () => {
    const session = sessionFor(ada);
    const stub = stubFetch({ 'POST /api/auth/register': { status: 201, body: session } });
    const onRegistered = vi.fn();
    const { user } = renderWithProviders(<RegisterForm onRegistered={onRegistered} />);
    const f = fields();

    await user.type(f.name, '  Ada Fenwick ');
    await user.type(f.email, 'Ada.Fenwick@Example.test');
    await user.type(f.password, 'jam-and-jars-2025');
    await user.click(f.submit);

    await waitFor(() => expect(onRegistered).toHaveBeenCalledWith(session));
    expect(stub.to('POST /api/auth/register')).toHaveLength(1);
    expect(stub.requests[0]).toMatchObject({
      credentials: 'include',
      // The schema trims the name and lower-cases the e-mail before it is sent.
      body: { name: 'Ada Fenwick', email: 'ada.fenwick@example.test', password: 'jam-and-jars-2025' },
    });
    expect(useSessionStore.getState()).toMatchObject({ status: 'signed-in', accessToken: session.accessToken });
  });

  it('shows a taken e-mail (409) on the e-mail field', async () => {
    stubFetch({
      'POST /api/auth/register': {
        status: 409,
        body: errorBody(409, 'email_taken', 'An account with this e-mail already exists.'),
      },
    });
    const { user } = renderWithProviders(<RegisterForm onRegistered={vi.fn()} />);
    const f = fields();

    await user.type(f.name, 'Ada Fenwick');
    await user.type(f.email, 'ada.fenwick@example.test');
    await user.type(f.password, 'jam-and-jars-2025');
    await user.click(f.submit);

    await waitFor(() => expectFieldError(f.email, 'An account with this e-mail already exists.'));
    expectFieldValid(f.name);
    expect(screen.queryByRole('alert')).toBeNull();
    expect(useSessionStore.getState().status).not.toBe('signed-in');
  });
});
