import type { KitchenView } from '@jarday/contracts';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { errorBody, stubFetch, type RecordedRequest, type Reply } from '../testing/fetch-stub';
import { orchardKitchen } from '../testing/fixtures';
import { api, ApiError, bindAuth } from './api-client';

const expired = { status: 401, body: errorBody(401, 'token_expired', 'Your session has expired.') };

/** Answers 200 only for the given token, as the server checks the bearer. */
const acceptOnly =
  (token: string, body: unknown = [orchardKitchen]) =>
  (req: RecordedRequest): Reply =>
    req.headers.Authorization === `Bearer ${token}` ? { status: 200, body } : expired;

describe('api client', () => {
  let token: string | null;
  let unbind: () => void;
  const renew = vi.fn<() => Promise<string | null>>();

  beforeEach(() => {
    token = 'old-token';
    renew.mockReset();
    unbind = bindAuth({ getAccessToken: () => token, renewAccessToken: renew });
  });
  afterEach(() => unbind());

  it('sends JSON with the bearer token and parses the answer', async () => {
    const stub = stubFetch({ 'POST /api/kitchens': { status: 201, body: orchardKitchen } });
    const created = await api.post<KitchenView>('/kitchens', { name: 'Orchard Lane kitchen' });

    expect(created).toEqual(orchardKitchen);
    expect(stub.requests).toHaveLength(1);
    expect(stub.requests[0]).toMatchObject({
      method: 'POST',
      path: '/api/kitchens',
      body: { name: 'Orchard Lane kitchen' },
      headers: { Authorization: 'Bearer old-token', 'Content-Type': 'application/json' },
    });
    expect(renew).not.toHaveBeenCalled();
  });

  it('on a 401 renews the token once and retries with the new one', async () => {
    const stub = stubFetch({ 'GET /api/kitchens': acceptOnly('new-token') });
    renew.mockImplementation(() => {
      token = 'new-token';
      return Promise.resolve(token);
    });

    await expect(api.get<KitchenView[]>('/kitchens')).resolves.toEqual([orchardKitchen]);
    expect(renew).toHaveBeenCalledTimes(1);
    expect(stub.to('GET /api/kitchens').map((r) => r.headers.Authorization)).toEqual([
      'Bearer old-token',
      'Bearer new-token',
    ]);
  });

  it('gives up with the 401 when the session cannot be renewed', async () => {
    const stub = stubFetch({ 'GET /api/kitchens': acceptOnly('never') });
    renew.mockResolvedValue(null);

    const error = await api.get('/kitchens').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).status).toBe(401);
    expect((error as ApiError).code).toBe('token_expired');
    expect(renew).toHaveBeenCalledTimes(1);
    expect(stub.to('GET /api/kitchens')).toHaveLength(1);
  });

  it('does not renew a second time when the retry is refused too', async () => {
    const stub = stubFetch({ 'GET /api/kitchens': acceptOnly('never') });
    renew.mockImplementation(() => {
      token = 'new-token';
      return Promise.resolve(token);
    });

    await expect(api.get('/kitchens')).rejects.toMatchObject({ status: 401 });
    expect(renew).toHaveBeenCalledTimes(1);
    expect(stub.to('GET /api/kitchens')).toHaveLength(2);
  });

  it('shares one renewal between requests refused at the same time', async () => {
    const stub = stubFetch({
      'GET /api/kitchens': acceptOnly('new-token'),
      'GET /api/kitchens/k1/members': acceptOnly('new-token', []),
    });
    let finish: (value: string) => void = () => undefined;
    renew.mockImplementation(
      () =>
        new Promise<string>((resolve) => {
          finish = (value) => {
            token = value;
            resolve(value);
          };
        }),
    );

    const both = Promise.all([api.get('/kitchens'), api.get('/kitchens/k1/members')]);
    await vi.waitFor(() => expect(renew).toHaveBeenCalled());
    await vi.waitFor(() => expect(stub.requests).toHaveLength(2));
    finish('new-token');

    await expect(both).resolves.toEqual([[orchardKitchen], []]);
    expect(renew).toHaveBeenCalledTimes(1);
    expect(stub.requests.filter((r) => r.headers.Authorization === 'Bearer new-token')).toHaveLength(2);
  });

  it('leaves a 401 alone when retrying is switched off (the auth calls themselves)', async () => {
    stubFetch({
      'POST /api/auth/sign-in': {
        status: 401,
        body: errorBody(401, 'invalid_credentials', 'Wrong e-mail or password.'),
      },
    });
    await expect(api.post('/auth/sign-in', {}, { retryOnUnauthorized: false })).rejects.toMatchObject({
      status: 401,
      code: 'invalid_credentials',
      message: 'Wrong e-mail or password.',
    });
    expect(renew).not.toHaveBeenCalled();
  });

  it('carries the field issues of a validation error', async () => {
    stubFetch({
      'POST /api/kitchens': {
        status: 400,
        body: errorBody(400, 'validation_failed', 'Check the highlighted fields.', [
          { path: 'altitude.value', message: 'Altitude must be a number' },
          { path: 'name', message: 'Name is required' },
        ]),
      },
    });
    const error = (await api.post('/kitchens', {}).catch((e: unknown) => e)) as ApiError;
    expect(error.fieldErrors()).toEqual({ 'altitude.value': 'Altitude must be a number', name: 'Name is required' });
    expect(renew).not.toHaveBeenCalled();
  });

  it('resolves a 204 to undefined', async () => {
    stubFetch({ 'DELETE /api/kitchens/k1/canners/c1': { status: 204 } });
    await expect(api.delete('/kitchens/k1/canners/c1')).resolves.toBeUndefined();
  });

  it('turns an unreachable server into a network_error', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));
    await expect(api.get('/health')).rejects.toMatchObject({ status: 0, code: 'network_error' });
  });
});
