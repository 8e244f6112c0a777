import { afterEach, describe, expect, it, vi } from 'vitest';
import { api, ApiError, parseApiError, tokenStorage } from './client';

function jsonResponse(status: number, body: unknown, statusText = ''): Response {
  return new Response(JSON.stringify(body), {
    status,
    statusText,
    headers: { 'content-type': 'application/json; charset=utf-8' },
  });
}

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

describe('api client', () => {
  it('sends the stored bearer token and JSON body', async () => {
    tokenStorage.set('token-123');
    const fetchMock = vi.fn(async () => jsonResponse(200, { id: 1 }));
    vi.stubGlobal('fetch', fetchMock);

    const result = await api.patch<{ id: number }>('/api/houses/1', { widthM: 9.144 });

    expect(result).toEqual({ id: 1 });
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/houses/1');
    expect(init.method).toBe('PATCH');
    expect((init.headers as Record<string, string>).Authorization).toBe('Bearer token-123');
    expect(init.body).toBe('{"widthM":9.144}');
  });

  it('throws ApiError with the server message and field on 422', async () => {
    vi.stubGlobal('fetch', async () =>
      jsonResponse(422, { statusCode: 422, message: 'house.widthM must be between 2 and 20', field: 'house.widthM' }),
    );
    await expect(api.post('/api/estimates', {})).rejects.toMatchObject({
      name: 'ApiError',
      status: 422,
      field: 'house.widthM',
      message: 'house.widthM must be between 2 and 20',
    });
  });

  it('forgets the token on 401 and tells subscribers', async () => {
    tokenStorage.set('expired');
    const seen: (string | null)[] = [];
    const unsubscribe = tokenStorage.subscribe((token) => seen.push(token));
    vi.stubGlobal('fetch', async () => jsonResponse(401, { statusCode: 401, message: 'Unauthorized' }));

    await expect(api.get('/api/auth/me')).rejects.toMatchObject({ status: 401 });
    expect(tokenStorage.get()).toBeNull();
    expect(seen).toEqual([null]);
    unsubscribe();
  });

  it('returns undefined for 204 No Content', async () => {
    vi.stubGlobal('fetch', async () => new Response(null, { status: 204 }));
    await expect(api.delete('/api/houses/3')).resolves.toBeUndefined();
  });

  it('reports an unreachable server as ApiError status 0', async () => {
    vi.stubGlobal('fetch', async () => {
      throw new TypeError('Failed to fetch');
    });
    await expect(api.get('/api/health')).rejects.toMatchObject({ status: 0 });
  });
});
