/**
 * The one HTTP client. Adds the bearer token, turns every error response into an ApiError
 * (the API's single error shape), and forgets the token on 401. No UI imports: the app
 * subscribes to token changes to decide where to send the user.
 */

export interface ApiErrorDetail {
  field: string;
  message: string;
}

export class ApiError extends Error {
  constructor(
    public readonly status: number,
    message: string,
    /** dotted path of the offending input, e.g. `house.widthM` (422) */
    public readonly field?: string,
    /** per-field validation messages (400) */
    public readonly details: ApiErrorDetail[] = [],
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

const TOKEN_STORAGE_KEY = 'thermbay.accessToken';
type TokenListener = (token: string | null) => void;
const tokenListeners = new Set<TokenListener>();

function notifyTokenListeners(token: string | null): void {
  for (const listener of tokenListeners) listener(token);
}

export const tokenStorage = {
  get(): string | null {
    try {
      return globalThis.localStorage?.getItem(TOKEN_STORAGE_KEY) ?? null;
    } catch {
      return null;
    }
  },
  set(token: string): void {
    globalThis.localStorage?.setItem(TOKEN_STORAGE_KEY, token);
    notifyTokenListeners(token);
  },
  clear(): void {
    globalThis.localStorage?.removeItem(TOKEN_STORAGE_KEY);
    notifyTokenListeners(null);
  },
  /** Returns an unsubscribe function (fits React's useSyncExternalStore). */
  subscribe(listener: TokenListener): () => void {
    tokenListeners.add(listener);
    return () => tokenListeners.delete(listener);
  },
};

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function parseDetails(value: unknown): ApiErrorDetail[] {
  if (!Array.isArray(value)) return [];
  return value.flatMap((item): ApiErrorDetail[] =>
    isRecord(item) && typeof item.field === 'string' && typeof item.message === 'string'
      ? [{ field: item.field, message: item.message }]
      : [],
  );
}

/** Builds an ApiError from a status and the (possibly non-JSON) response body. */
export function parseApiError(status: number, statusText: string, body: unknown): ApiError {
  if (!isRecord(body)) {
    const text = typeof body === 'string' && body.trim() ? body.trim() : statusText;
    return new ApiError(status, text || `Request failed (${status})`);
  }
  const details = parseDetails(body.details);
  let message: string;
  if (typeof body.message === 'string') {
    message = body.message;
  } else if (Array.isArray(body.message)) {
    // A bare framework validation error lists messages; keep them readable.
    message = body.message.filter((m): m is string => typeof m === 'string').join('; ');
  } else if (typeof body.error === 'string') {
    message = body.error;
  } else {
    message = statusText || `Request failed (${status})`;
  }
  const field = typeof body.field === 'string' ? body.field : undefined;
  return new ApiError(status, message, field, details);
}

export interface RequestOptions {
  signal?: AbortSignal;
}

async function readBody(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  const contentType = response.headers.get('content-type') ?? '';
  if (contentType.includes('json')) {
    try {
      return JSON.parse(text) as unknown;
    } catch {
      return text;
    }
  }
  return text;
}

export async function apiRequest<T>(
  method: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE',
  path: string,
  body?: unknown,
  options: RequestOptions = {},
): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  const token = tokenStorage.get();
  if (token) headers.Authorization = `Bearer ${token}`;
  if (body !== undefined) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'Cannot reach the Thermbay server. Check your connection and try again.');
  }

  const payload = await readBody(response);
  if (!response.ok) {
    if (response.status === 401 && token) tokenStorage.clear();
    throw parseApiError(response.status, response.statusText, payload);
  }
  return payload as T;
}

export const api = {
  get: <T>(path: string, options?: RequestOptions) => apiRequest<T>('GET', path, undefined, options),
  post: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    apiRequest<T>('POST', path, body, options),
  patch: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    apiRequest<T>('PATCH', path, body, options),
  delete: <T = void>(path: string, options?: RequestOptions) =>
    apiRequest<T>('DELETE', path, undefined, options),
};
