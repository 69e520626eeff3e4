import type { ApiErrorBody } from '@jarday/contracts';
import { API_BASE } from '../../../config/env';
import { api, ApiError } from '../../../lib/api-client';
import { liveDeviceId } from '../../../lib/device-id';
import { useSessionStore } from '../../auth/stores/session-store';

const send = (path: string, init: RequestInit) => {
  const token = useSessionStore.getState().accessToken;
  const headers = new Headers(init.headers);
  if (token) headers.set('Authorization', `Bearer ${token}`);
  headers.set('X-Device-Id', liveDeviceId());
  return fetch(`${API_BASE}${path}`, { ...init, headers, credentials: 'same-origin' });
};

/**
 * fetch() for the one body the JSON client cannot carry, a multipart upload. On a 401 the shared client renews
 * the session (one renewal for all callers) and the request is sent once more.
 */
export async function authedFetch(path: string, init: RequestInit = {}): Promise<Response> {
  let response: Response;
  try {
    response = await send(path, init);
    if (response.status === 401) {
      await api.get('/auth/me').catch(() => undefined);
      response = await send(path, init);
    }
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError({
      statusCode: 0,
      code: 'network_error',
      message: 'Cannot reach the Jarday server. Check the connection and try again.',
    });
  }
  if (!response.ok) throw new ApiError(await errorBody(response));
  return response;
}

async function errorBody(response: Response): Promise<ApiErrorBody> {
  try {
    const body = (await response.json()) as Partial<ApiErrorBody>;
    if (typeof body.message === 'string' && typeof body.code === 'string') {
      return { statusCode: response.status, code: body.code, message: body.message, issues: body.issues };
    }
  } catch {
    // not JSON: fall through to a generic sentence
  }
  return {
    statusCode: response.status,
    code: 'http_error',
    message:
      response.status === 413 ? 'This file is too large.' : `The request failed (${response.status}). Try again.`,
  };
}
