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
    /** 409 on a stale write: what is stored now, in the shape its GET answers */
    public readonly current?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

/** Something stored now, as a versioned resource's GET answers it. */
export interface Versioned {
  version: number;
}

/** A 409 answered to a save based on an old version: someone else saved first. */
export function isStaleWrite(error: unknown): error is ApiError & { current: Versioned } {
  return (
    error instanceof ApiError &&
    error.status === 409 &&
    typeof error.current === 'object' &&
    error.current !== null &&
    typeof (error.current as Partial<Versioned>).version === 'number'
  );
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
  return new ApiError(status, message, field, details, body.current);
}

export interface RequestOptions {
  signal?: AbortSignal;
  /** the version the write is based on, sent as If-Match (houses, farms, climates, calendars, fuel prices) */
  ifMatch?: number;
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
  if (options.ifMatch !== undefined) headers['If-Match'] = String(options.ifMatch);

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
  post: <T>(path: string, body?: unknown, options?: RequestOptions) => apiRequest<T>('POST', path, body, options),
  put: <T>(path: string, body?: unknown, options?: RequestOptions) => apiRequest<T>('PUT', path, body, options),
  patch: <T>(path: string, body?: unknown, options?: RequestOptions) => apiRequest<T>('PATCH', path, body, options),
  delete: <T = void>(path: string, options?: RequestOptions) => apiRequest<T>('DELETE', path, undefined, options),
};

export interface UploadProgress {
  loadedBytes: number;
  /** null when the browser cannot tell the body's size */
  totalBytes: number | null;
  /** 0–1, or null when the total is unknown */
  fraction: number | null;
}

export interface UploadOptions extends RequestOptions {
  method?: 'POST' | 'PUT';
  onProgress?: (progress: UploadProgress) => void;
}

function parseXhrBody(request: XMLHttpRequest): unknown {
  const text = request.responseText;
  if (!text) return undefined;
  if ((request.getResponseHeader('content-type') ?? '').includes('json')) {
    try {
      return JSON.parse(text) as unknown;
    } catch {
      return text;
    }
  }
  return text;
}

/**
 * Sends a multipart body and reports how much of it has left the browser. fetch cannot report
 * upload progress, so this one call uses XMLHttpRequest — with the same bearer token, the same
 * error shape (ApiError) and the same sign-out on 401 as every other request.
 */
export function uploadWithProgress<T>(path: string, body: FormData, options: UploadOptions = {}): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const { signal, onProgress, method = 'POST' } = options;
    if (signal?.aborted) {
      reject(new DOMException('The upload was cancelled', 'AbortError'));
      return;
    }
    const request = new XMLHttpRequest();
    request.open(method, path);
    request.setRequestHeader('Accept', 'application/json');
    const token = tokenStorage.get();
    if (token) request.setRequestHeader('Authorization', `Bearer ${token}`);
    // No Content-Type: the browser writes the multipart boundary itself.

    const onAbortSignal = () => request.abort();
    signal?.addEventListener('abort', onAbortSignal, { once: true });
    const settle = () => signal?.removeEventListener('abort', onAbortSignal);

    request.upload.addEventListener('progress', (event: ProgressEvent) => {
      const totalBytes = event.lengthComputable && event.total > 0 ? event.total : null;
      onProgress?.({
        loadedBytes: event.loaded,
        totalBytes,
        fraction: totalBytes === null ? null : Math.min(1, event.loaded / totalBytes),
      });
    });
    request.addEventListener('load', () => {
      settle();
      const payload = parseXhrBody(request);
      if (request.status >= 200 && request.status < 300) {
        resolve(payload as T);
        return;
      }
      if (request.status === 401 && token) tokenStorage.clear();
      reject(parseApiError(request.status, request.statusText, payload));
    });
    request.addEventListener('error', () => {
      settle();
      reject(new ApiError(0, 'Cannot reach the Thermbay server. Check your connection and try again.'));
    });
    request.addEventListener('abort', () => {
      settle();
      reject(new DOMException('The upload was cancelled', 'AbortError'));
    });
    request.send(body);
  });
}

/** Sends a small multipart body with fetch (no progress needed), same token and errors. */
export async function postForm<T>(path: string, body: FormData, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  const token = tokenStorage.get();
  if (token) headers.Authorization = `Bearer ${token}`;
  let response: Response;
  try {
    response = await fetch(path, { method: 'POST', headers, body, signal: options.signal });
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

export interface DownloadedFile {
  blob: Blob;
  /** from Content-Disposition, or the fallback */
  fileName: string;
}

function fileNameFrom(contentDisposition: string | null, fallback: string): string {
  const match = /filename\*?=(?:UTF-8'')?"?([^";]+)"?/i.exec(contentDisposition ?? '');
  if (!match?.[1]) return fallback;
  try {
    return decodeURIComponent(match[1]);
  } catch {
    return match[1];
  }
}

/** GETs a file (e.g. a CSV export) with the token, as a Blob; errors as ApiError. */
export async function downloadFile(
  path: string,
  fallbackFileName: string,
  options: RequestOptions = {},
): Promise<DownloadedFile> {
  const headers: Record<string, string> = {};
  const token = tokenStorage.get();
  if (token) headers.Authorization = `Bearer ${token}`;
  let response: Response;
  try {
    response = await fetch(path, { method: 'GET', headers, signal: options.signal });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'Cannot reach the Thermbay server. Check your connection and try again.');
  }
  if (!response.ok) {
    const payload = await readBody(response);
    if (response.status === 401 && token) tokenStorage.clear();
    throw parseApiError(response.status, response.statusText, payload);
  }
  return {
    blob: await response.blob(),
    fileName: fileNameFrom(response.headers.get('content-disposition'), fallbackFileName),
  };
}
