import { onTestFinished, vi } from 'vitest';

export interface MockRequest {
  method: string;
  path: string;
  search: URLSearchParams;
  headers: Headers;
  body: unknown;
}

export interface MockReply {
  status: number;
  body?: unknown;
}

type Handler = MockReply | ((request: MockRequest) => MockReply | Promise<MockReply>);

/**
 * Stands in for the server at the fetch boundary. Routes are keyed 'METHOD /api/path' (no query string).
 * A request no route answers fails the test.
 */
export function mockApi(routes: Record<string, Handler>) {
  const calls: MockRequest[] = [];
  const unhandled: string[] = [];

  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const href = input instanceof Request ? input.url : input instanceof URL ? input.href : input;
    const url = new URL(href, 'http://keenroute.test');
    const method = (init.method ?? 'GET').toUpperCase();
    const request: MockRequest = {
      method,
      path: url.pathname,
      search: url.searchParams,
      headers: new Headers(init.headers),
      body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
    };
    calls.push(request);
    const handler = routes[`${method} ${url.pathname}`];
    if (!handler) {
      unhandled.push(`${method} ${url.pathname}`);
      return new Response(JSON.stringify({ statusCode: 501, message: 'No mock for this route' }), { status: 501 });
    }
    const reply = typeof handler === 'function' ? await handler(request) : handler;
    if (reply.body === undefined) return new Response(null, { status: reply.status });
    return new Response(JSON.stringify(reply.body), {
      status: reply.status,
      headers: { 'Content-Type': 'application/json' },
    });
  });

  vi.stubGlobal('fetch', fetchMock);
  onTestFinished(() => {
    if (unhandled.length > 0) throw new Error(`Requests with no mock: ${unhandled.join(', ')}`);
  });

  return {
    calls,
    callsTo: (method: string, path: string) => calls.filter((call) => call.method === method && call.path === path),
  };
}
