import type { ApiErrorBody } from '@jarday/contracts';
import { vi } from 'vitest';

/** One request as the app sent it, with the JSON body parsed. */
export interface RecordedRequest {
  method: string;
  path: string;
  body: unknown;
  headers: Record<string, string>;
  credentials: RequestCredentials | undefined;
}

export interface Reply {
  status: number;
  body?: unknown;
}

type Handler = Reply | ((request: RecordedRequest) => Reply | Promise<Reply>);

/**
 * Replaces `fetch` with a table of answers keyed `METHOD /path` (no query string). Every request is
 * recorded; one that has no answer gets a 501 `not_stubbed` body, so a test that relies on it fails.
 */
export function stubFetch(routes: Record<string, Handler>) {
  const requests: RecordedRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(
      typeof input === 'string' ? input : input instanceof URL ? input.href : input.url,
      'http://jarday.test',
    );
    const request: RecordedRequest = {
      method: (init.method ?? 'GET').toUpperCase(),
      path: url.pathname,
      body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
      headers: { ...(init.headers as Record<string, string> | undefined) },
      credentials: init.credentials,
    };
    requests.push(request);
    const handler = routes[`${request.method} ${request.path}`];
    const reply: Reply = handler
      ? typeof handler === 'function'
        ? await handler(request)
        : handler
      : { status: 501, body: errorBody(501, 'not_stubbed', `No stub for ${request.method} ${request.path}`) };
    return new Response(reply.body === undefined ? null : JSON.stringify(reply.body), {
      status: reply.status,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return {
    requests,
    fetchMock,
    /** The requests sent to one `METHOD /path`. */
    to: (key: string) => requests.filter((r) => `${r.method} ${r.path}` === key),
  };
}

export function errorBody(
  statusCode: number,
  code: string,
  message: string,
  issues?: ApiErrorBody['issues'],
): ApiErrorBody {
  return issues ? { statusCode, code, message, issues } : { statusCode, code, message };
}
