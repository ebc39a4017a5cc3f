import { vi } from 'vitest';

type FakeAnswer = { status?: number; body?: unknown };
type FakeRoute = FakeAnswer | ((request: { body: unknown; headers: Record<string, string> }) => FakeAnswer);

export type FakeCall = { method: string; path: string; body: unknown; headers: Record<string, string> };

// Stands in for the server: answers `"METHOD /api/path"` keys, records every call, and fails
// loudly (404 with a code) for anything a test did not expect.
export function fakeApi(routes: Record<string, FakeRoute>) {
  const calls: FakeCall[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const path = typeof input === 'string' ? input : input.toString();
    const method = (init.method ?? 'GET').toUpperCase();
    const headers = Object.fromEntries(Object.entries((init.headers ?? {}) as Record<string, string>));
    const body = typeof init.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined;
    calls.push({ method, path, body, headers });
    const route = routes[`${method} ${path}`];
    const answer: FakeAnswer = typeof route === 'function' ? route({ body, headers }) : (route ?? {
      status: 404,
      body: { error: { code: 'test.unexpected_route', message: `No fake for ${method} ${path}` } },
    });
    const status = answer.status ?? 200;
    return new Response(answer.body === undefined ? null : JSON.stringify(answer.body), {
      status,
      headers: { 'content-type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { calls, fetchMock };
}

export const apiError = (status: number, code: string, message: string, fields?: Record<string, string>) => ({
  status,
  body: { error: { code, message, ...(fields ? { fields } : {}) } },
});
