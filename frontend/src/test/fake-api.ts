import { vi, type Mock } from 'vitest';
import { ApiError } from '../api/client';

/**
 * Answers one method's requests: gets the path (with any query string), the JSON body sent and
 * the request itself (for headers); returns the answer's JSON body, a Response, or throws an
 * ApiError to answer with that error in the API's error shape.
 */
export type FakeRoute = (path: string, body: unknown, request: Request) => unknown;

export interface FakeApi {
  get: Mock<FakeRoute>;
  post: Mock<FakeRoute>;
  put: Mock<FakeRoute>;
  patch: Mock<FakeRoute>;
  delete: Mock<FakeRoute>;
  /** Replaces fetch with these routes (call in beforeEach; `vi.unstubAllGlobals()` undoes it). */
  install(): void;
}

function json(status: number, body: unknown): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: body === undefined ? {} : { 'content-type': 'application/json; charset=utf-8' },
  });
}

async function jsonBody(request: Request): Promise<unknown> {
  const text = await request.clone().text();
  if (!text) return undefined;
  return (request.headers.get('content-type') ?? '').includes('json') ? (JSON.parse(text) as unknown) : text;
}

/**
 * The API played in component tests, one mock per method, behind fetch: requests go through the
 * real client (paths filled from their parameters, bodies serialized, token and If-Match headers,
 * error answers parsed into ApiError), so a test sees what would go over the wire.
 */
export function fakeApi(): FakeApi {
  const routes = {
    GET: vi.fn<FakeRoute>(),
    POST: vi.fn<FakeRoute>(),
    PUT: vi.fn<FakeRoute>(),
    PATCH: vi.fn<FakeRoute>(),
    DELETE: vi.fn<FakeRoute>(),
  };
  const answer = async (request: Request): Promise<Response> => {
    const url = new URL(request.url);
    const route = routes[request.method as keyof typeof routes];
    try {
      const result: unknown = await route(url.pathname + url.search, await jsonBody(request), request);
      return result instanceof Response ? result : json(result === undefined ? 204 : 200, result);
    } catch (error) {
      if (!(error instanceof ApiError)) return json(500, { statusCode: 500, message: String(error) });
      const { status, message, field, details, current } = error;
      return json(status, { statusCode: status, message, field, details, current });
    }
  };
  return {
    get: routes.GET,
    post: routes.POST,
    put: routes.PUT,
    patch: routes.PATCH,
    delete: routes.DELETE,
    install: () => vi.stubGlobal('fetch', answer),
  };
}

/** The path and query string a request asks for (the client sends absolute URLs). */
export function requestPath(request: Request): string {
  const url = new URL(request.url);
  return url.pathname + url.search;
}
