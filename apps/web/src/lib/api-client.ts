import { liveDeviceId } from './device-id';
import type { ApiErrorBody } from '@jarday/contracts';
import { API_BASE } from '../config/env';

/** An error answer from the API (or a failure to reach it), carrying the server's body. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly body: ApiErrorBody;

  constructor(body: ApiErrorBody) {
    super(body.message);
    this.name = 'ApiError';
    this.status = body.statusCode;
    this.code = body.code;
    this.body = body;
  }

  /** Field messages keyed by dotted path (`altitude.value`), the first message per field. */
  fieldErrors(): Record<string, string> {
    const out: Record<string, string> = {};
    for (const issue of this.body.issues ?? []) {
      if (issue.path && !(issue.path in out)) out[issue.path] = issue.message;
    }
    return out;
  }
}

/** How the client gets and renews the bearer token; bound by the auth feature at start-up. */
export interface AuthBinding {
  getAccessToken: () => string | null;
  /** Obtain a fresh access token, or null when the session is gone. */
  renewAccessToken: () => Promise<string | null>;
}

const signedOutBinding: AuthBinding = { getAccessToken: () => null, renewAccessToken: () => Promise.resolve(null) };
let binding: AuthBinding = signedOutBinding;
let renewal: Promise<string | null> | null = null;

/** Connects the client to the session; returns a function that disconnects it. */
export function bindAuth(next: AuthBinding): () => void {
  binding = next;
  return () => {
    if (binding === next) binding = signedOutBinding;
  };
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
  /** `include` for /api/auth calls, which carry the httpOnly refresh cookie. */
  credentials?: RequestCredentials;
  /** On a 401, renew the token once and retry. Off for the auth calls themselves. */
  retryOnUnauthorized?: boolean;
}

/**
 * Calls the Jarday API: JSON in and out, the bearer token attached, and on a 401 one renewal of the
 * token followed by one retry. Concurrent 401s share a single renewal, since the server rotates the
 * refresh cookie and a second parallel refresh would present a cookie that is already spent.
 * Resolves to the parsed body (undefined for 204); rejects with an {@link ApiError}.
 */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const { retryOnUnauthorized = true } = options;
  const sentWith = binding.getAccessToken();
  const response = await send(path, options, sentWith);
  if (response.status === 401 && retryOnUnauthorized) {
    // Another call may already have renewed the token while this one was in flight.
    const current = binding.getAccessToken();
    const token = current && current !== sentWith ? current : await renewOnce();
    if (token) return parse<T>(await send(path, options, token));
  }
  return parse<T>(response);
}

function renewOnce(): Promise<string | null> {
  renewal ??= binding
    .renewAccessToken()
    .catch(() => null)
    .finally(() => {
      renewal = null;
    });
  return renewal;
}

async function send(path: string, options: RequestOptions, token: string | null): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (token) headers.Authorization = `Bearer ${token}`;
  // The journal names the device a change came from, for REST changes as for socket commands.
  headers['X-Device-Id'] = liveDeviceId();
  try {
    return await fetch(`${API_BASE}${path}`, {
      method: options.method ?? 'GET',
      headers,
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      credentials: options.credentials ?? 'same-origin',
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError({
      statusCode: 0,
      code: 'network_error',
      message: 'Cannot reach the Jarday server. Check the connection and try again.',
    });
  }
}

async function parse<T>(response: Response): Promise<T> {
  const text = await response.text();
  const data: unknown = text ? safeJson(text) : undefined;
  if (response.ok) return data as T;
  throw new ApiError(isErrorBody(data) ? data : fallbackBody(response.status));
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

function isErrorBody(data: unknown): data is ApiErrorBody {
  if (typeof data !== 'object' || data === null) return false;
  const d = data as Record<string, unknown>;
  return typeof d.statusCode === 'number' && typeof d.code === 'string' && typeof d.message === 'string';
}

function fallbackBody(status: number): ApiErrorBody {
  return {
    statusCode: status,
    code: 'http_error',
    message: status >= 500 ? 'The server had a problem. Try again in a moment.' : `The request failed (${status}).`,
  };
}

/**
 * Fetches a file (a PDF, a photo) with the same bearer token and one renewal on a 401 as {@link apiRequest}.
 * Resolves to the bytes; rejects with an {@link ApiError} carrying the server's message when it refuses.
 */
export async function apiBlob(path: string, options: Omit<RequestOptions, 'method' | 'body'> = {}): Promise<Blob> {
  const sentWith = binding.getAccessToken();
  let response = await send(path, options, sentWith);
  if (response.status === 401 && options.retryOnUnauthorized !== false) {
    const current = binding.getAccessToken();
    const token = current && current !== sentWith ? current : await renewOnce();
    if (token) response = await send(path, options, token);
  }
  if (response.ok) return response.blob();
  return parse<never>(response);
}

/** Shorthands that read like the REST table. */
export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) => apiRequest<T>(path, options),
  post: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'POST', body }),
  put: <T>(path: string, body: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'PUT', body }),
  patch: <T>(path: string, body: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'PATCH', body }),
  delete: (path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<void>(path, { ...options, method: 'DELETE' }),
};
