import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiError, client, ifMatch, isStaleWrite, multipartBody, parseApiError, tokenStorage, unwrap } from './client';

function jsonResponse(status: number, body: unknown, statusText = ''): Response {
  return new Response(JSON.stringify(body), {
    status,
    statusText,
    headers: { 'content-type': 'application/json; charset=utf-8' },
  });
}

/** Replaces fetch with one answer; returns the mock to read the Request it was given. */
function answerWith(makeResponse: () => Response) {
  const fetchMock = vi.fn(async (_request: Request) => makeResponse());
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

const pathOf = (request: Request) => {
  const url = new URL(request.url);
  return url.pathname + url.search;
};

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('parseApiError', () => {
  it('reads the contract error shape: status, message, field and details', () => {
    const error = parseApiError(422, 'Unprocessable Entity', {
      statusCode: 422,
      error: 'Unprocessable Entity',
      message: 'house.widthM must be between 2 and 20',
      field: 'house.widthM',
      details: [{ field: 'widthM', message: 'widthM must not be less than 2' }],
    });
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(422);
    expect(error.message).toBe('house.widthM must be between 2 and 20');
    expect(error.field).toBe('house.widthM');
    expect(error.details).toEqual([{ field: 'widthM', message: 'widthM must not be less than 2' }]);
  });

  it('joins a list of messages and ignores malformed details', () => {
    const error = parseApiError(400, 'Bad Request', {
      message: ['name should not be empty', 'spans must be an integer'],
      details: [{ field: 'name' }, 'nonsense', { field: 'spans', message: 'spans must be an integer' }],
    });
    expect(error.message).toBe('name should not be empty; spans must be an integer');
    expect(error.details).toEqual([{ field: 'spans', message: 'spans must be an integer' }]);
    expect(error.field).toBeUndefined();
  });

  it('falls back to the status text for a body that is not JSON', () => {
    const error = parseApiError(502, 'Bad Gateway', undefined);
    expect(error.message).toBe('Bad Gateway');
    expect(error.status).toBe(502);
  });
});

describe('the typed client', () => {
  it('fills the path, sends the bearer token, If-Match and the JSON body', async () => {
    tokenStorage.set('token-123');
    const fetchMock = answerWith(() => jsonResponse(200, { id: 1, version: 5 }));

    const result = await unwrap(
      client.PATCH('/api/houses/{houseId}', {
        params: { path: { houseId: 1 }, header: ifMatch(4) },
        body: { widthM: 9.144 },
      }),
    );

    expect(result).toEqual({ id: 1, version: 5 });
    const request = fetchMock.mock.calls[0]![0];
    expect(pathOf(request)).toBe('/api/houses/1');
    expect(request.method).toBe('PATCH');
    expect(request.headers.get('Authorization')).toBe('Bearer token-123');
    expect(request.headers.get('If-Match')).toBe('4');
    expect(request.headers.get('Content-Type')).toBe('application/json');
    expect(await request.text()).toBe('{"widthM":9.144}');
  });

  it('sends no Authorization header when signed out, and writes query parameters', async () => {
    const fetchMock = answerWith(() => jsonResponse(200, { fromYear: 2020, toYear: 2022 }));
    await unwrap(
      client.GET('/api/farms/{farmId}/weather/climate-proposal', {
        params: { path: { farmId: 7 }, query: { fromYear: 2020, toYear: 2022 } },
      }),
    );
    const request = fetchMock.mock.calls[0]![0];
    expect(pathOf(request)).toBe('/api/farms/7/weather/climate-proposal?fromYear=2020&toYear=2022');
    expect(request.headers.has('Authorization')).toBe(false);
  });

  it('sends a multipart body as the browser builds it, not as JSON', async () => {
    const fetchMock = answerWith(() => jsonResponse(200, { columns: [] }));
    const form = new FormData();
    form.append('file', new Blob(['Time,Temp\n'], { type: 'text/csv' }), 'log.csv');
    await unwrap(
      client.POST('/api/farms/{farmId}/temperature-logs/inspect', {
        params: { path: { farmId: 2 } },
        body: multipartBody(form),
      }),
    );
    const request = fetchMock.mock.calls[0]![0];
    expect(pathOf(request)).toBe('/api/farms/2/temperature-logs/inspect');
    expect(request.headers.get('Content-Type')).toMatch(/^multipart\/form-data; boundary=/);
    // (jsdom's FormData loses the file name on its way into Node's Request: only the part is checked)
    expect(await request.text()).toContain('name="file"');
  });

  it('throws ApiError with the server message and field on 422', async () => {
    answerWith(() =>
      jsonResponse(422, { statusCode: 422, message: 'house.widthM must be between 2 and 20', field: 'house.widthM' }),
    );
    await expect(
      unwrap(
        client.PATCH('/api/houses/{houseId}', {
          params: { path: { houseId: 1 }, header: ifMatch(4) },
          body: { widthM: 50 },
        }),
      ),
    ).rejects.toMatchObject({
      name: 'ApiError',
      status: 422,
      field: 'house.widthM',
      message: 'house.widthM must be between 2 and 20',
    });
  });

  it('rejects even without unwrap: every error answer becomes an ApiError', async () => {
    answerWith(() => jsonResponse(404, { statusCode: 404, message: 'No such farm' }));
    const error: unknown = await client.GET('/api/farms/{farmId}', { params: { path: { farmId: 9 } } }).catch((e) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 404, message: 'No such farm' });
  });

  it('carries what is stored now on a 409, so the save can offer to reload or overwrite', async () => {
    tokenStorage.set('token-123');
    const current = { id: 3, name: 'North farm', version: 8 };
    answerWith(() => jsonResponse(409, { statusCode: 409, message: 'Someone else saved this farm first', current }));
    const error: unknown = await unwrap(
      client.PATCH('/api/farms/{farmId}', {
        params: { path: { farmId: 3 }, header: ifMatch(7) },
        body: { name: 'Mine' },
      }),
    ).catch((e) => e);
    expect(error).toMatchObject({ status: 409, message: 'Someone else saved this farm first', current });
    expect(isStaleWrite(error)).toBe(true);
    // a 409 is no reason to sign out
    expect(tokenStorage.get()).toBe('token-123');
  });

  it('forgets the token on 401 and tells subscribers', async () => {
    tokenStorage.set('expired');
    const seen: (string | null)[] = [];
    const unsubscribe = tokenStorage.subscribe((token) => seen.push(token));
    answerWith(() => jsonResponse(401, { statusCode: 401, message: 'Unauthorized' }));

    await expect(unwrap(client.GET('/api/auth/me'))).rejects.toMatchObject({ status: 401 });
    expect(tokenStorage.get()).toBeNull();
    expect(seen).toEqual([null]);
    unsubscribe();
  });

  it('a 401 to a request sent without a token (a wrong password) signs nobody out', async () => {
    const seen: (string | null)[] = [];
    const unsubscribe = tokenStorage.subscribe((token) => seen.push(token));
    answerWith(() => jsonResponse(401, { statusCode: 401, message: 'Wrong email or password' }));
    await expect(
      unwrap(client.POST('/api/auth/login', { body: { email: 'a@example.com', password: 'nope' } })),
    ).rejects.toMatchObject({ status: 401, message: 'Wrong email or password' });
    expect(seen).toEqual([]);
    unsubscribe();
  });

  it('reads a text error body as the message', async () => {
    answerWith(() => new Response('upstream down', { status: 502, statusText: 'Bad Gateway' }));
    await expect(unwrap(client.GET('/api/health'))).rejects.toMatchObject({ status: 502, message: 'upstream down' });
  });

  it('returns undefined for 204 No Content', async () => {
    answerWith(() => new Response(null, { status: 204 }));
    await expect(
      unwrap(client.DELETE('/api/houses/{houseId}', { params: { path: { houseId: 3 } } })),
    ).resolves.toBeUndefined();
  });

  it('reports an unreachable server as ApiError status 0', async () => {
    vi.stubGlobal('fetch', async () => {
      throw new TypeError('Failed to fetch');
    });
    await expect(unwrap(client.GET('/api/health'))).rejects.toMatchObject({ name: 'ApiError', status: 0 });
  });

  it('lets a cancelled request stay a cancellation (not an error to show)', async () => {
    vi.stubGlobal('fetch', async () => {
      throw new DOMException('The operation was aborted', 'AbortError');
    });
    const error: unknown = await unwrap(client.GET('/api/health')).catch((e) => e);
    expect(error).not.toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ name: 'AbortError' });
  });
});

describe('unwrap', () => {
  it('throws an error answer it is handed as ApiError', async () => {
    const answer = Promise.resolve({
      error: { statusCode: 428, message: 'Send If-Match: <version> with the version you loaded', field: 'If-Match' },
      response: new Response(null, { status: 428 }),
    });
    await expect(unwrap(answer)).rejects.toMatchObject({ name: 'ApiError', status: 428, field: 'If-Match' });
  });
});
