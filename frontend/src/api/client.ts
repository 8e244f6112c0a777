/**
 * The one HTTP client: an openapi-fetch client typed from the generated contract
 * (`paths` in schema.d.ts), so every path, path parameter, request body and answer is checked
 * against the API. Its middleware adds the bearer token, forgets the token on 401 and turns
 * every error response into an ApiError (the API's single error shape). Two helpers sit
 * beside it: `uploadWithProgress` (XMLHttpRequest, the one way to see upload progress) and
 * `downloadFile` (a GET answered as a file). No UI imports: the app subscribes to token
 * changes to decide where to send the user.
 *
 *   unwrap(client.GET('/api/farms/{farmId}', { params: { path: { farmId } }, signal }))
 *   unwrap(client.PATCH('/api/farms/{farmId}', { params: { path: { farmId }, header: ifMatch(version) }, body }))
 */
import createClient, { type Middleware } from 'openapi-fetch';
import type { paths } from './schema';

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

const UNREACHABLE = 'Cannot reach the Thermbay server. Check your connection and try again.';

function isAbort(error: unknown): boolean {
  return error instanceof DOMException && error.name === 'AbortError';
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

/**
 * Every request: the bearer token (when signed in); every answer: a 401 to a signed-in request
 * forgets the token, and any error answer is thrown as an ApiError, so a call either resolves
 * with its data or rejects with ApiError (status 0 when the server cannot be reached).
 */
export const sessionMiddleware: Middleware = {
  onRequest({ request }) {
    if (!request.headers.has('Accept')) request.headers.set('Accept', 'application/json');
    const token = tokenStorage.get();
    if (token) request.headers.set('Authorization', `Bearer ${token}`);
    return request;
  },
  async onResponse({ request, response }) {
    if (response.ok) return undefined;
    if (response.status === 401 && request.headers.has('Authorization')) tokenStorage.clear();
    throw parseApiError(response.status, response.statusText, await readBody(response));
  },
  onError({ error }) {
    if (isAbort(error)) return undefined;
    return new ApiError(0, UNREACHABLE);
  },
};

export const client = createClient<paths>({
  // Same origin as the page; absolute so the Request is valid outside a browser page too (tests).
  baseUrl: globalThis.location?.origin ?? '',
  // Looked up per call, so tests can replace fetch after this module loaded.
  fetch: (request) => globalThis.fetch(request),
});
client.use(sessionMiddleware);

/** An openapi-fetch answer: data on success, error otherwise. */
interface FetchResult<T> {
  data?: T;
  error?: unknown;
  response: Response;
}

/**
 * The data of a call, or its ApiError thrown. The middleware already throws on every error
 * answer; this turns what is left into a plain promise of the data (undefined for 204).
 */
export async function unwrap<T>(call: Promise<FetchResult<T>>): Promise<T> {
  const { data, error, response } = await call;
  if (error !== undefined || !response.ok) throw parseApiError(response.status, response.statusText, error);
  return data as T;
}

/**
 * The If-Match header of a versioned write (houses, farms, climates, calendars, fuel prices, fuel
 * records): the version the edit was based on, under the name the contract gives it (HTTP header
 * names are case-insensitive).
 */
export function ifMatch(version: number): { 'if-match': string } {
  return { 'if-match': String(version) };
}

/**
 * A multipart body as the contract types it. The contract writes a file part as a string
 * (OpenAPI's binary format); the browser sends the FormData itself, with its own boundary.
 */
export function multipartBody<T>(form: FormData): NonNullable<T> {
  return form as unknown as NonNullable<T>;
}

export interface UploadProgress {
  loadedBytes: number;
  /** null when the browser cannot tell the body's size */
  totalBytes: number | null;
  /** 0–1, or null when the total is unknown */
  fraction: number | null;
}

export interface UploadOptions {
  signal?: AbortSignal;
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
 * error shape (ApiError) and the same sign-out on 401 as the client. Name the answer's type
 * from the contract (e.g. `uploadWithProgress<TemperatureLog>`).
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
      reject(new ApiError(0, UNREACHABLE));
    });
    request.addEventListener('abort', () => {
      settle();
      reject(new DOMException('The upload was cancelled', 'AbortError'));
    });
    request.send(body);
  });
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

/**
 * A file (CSV export, PDF, attachment) fetched through the client, named from Content-Disposition:
 *
 *   downloadFile(client.GET('/api/reports/{reportId}/pdf', { params: { path: { reportId } }, parseAs: 'blob' }), 'report.pdf')
 */
export async function downloadFile(
  call: Promise<FetchResult<Blob>>,
  fallbackFileName: string,
): Promise<DownloadedFile> {
  const { response } = await call;
  const blob = await unwrap(call);
  return { blob, fileName: fileNameFrom(response.headers.get('content-disposition'), fallbackFileName) };
}
