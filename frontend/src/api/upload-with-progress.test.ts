import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiError, client, downloadFile, tokenStorage, uploadWithProgress, type UploadProgress } from './client';

type Listener = (event: ProgressEvent) => void;

/** Enough of XMLHttpRequest to drive uploadWithProgress: the test plays the network. */
class FakeXhr {
  static last: FakeXhr | null = null;
  method = '';
  url = '';
  headers: Record<string, string> = {};
  body: unknown = null;
  status = 0;
  statusText = '';
  responseText = '';
  responseHeaders: Record<string, string> = {};
  aborted = false;
  private listeners: Record<string, Listener[]> = {};
  private uploadListeners: Record<string, Listener[]> = {};
  upload = {
    addEventListener: (type: string, listener: Listener) => {
      (this.uploadListeners[type] ??= []).push(listener);
    },
  };

  constructor() {
    FakeXhr.last = this;
  }
  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name] = value;
  }
  getResponseHeader(name: string) {
    return this.responseHeaders[name.toLowerCase()] ?? null;
  }
  addEventListener(type: string, listener: Listener) {
    (this.listeners[type] ??= []).push(listener);
  }
  send(body: unknown) {
    this.body = body;
  }
  abort() {
    this.aborted = true;
    this.emit('abort');
  }
  // --- test side ---
  progress(loaded: number, total: number, lengthComputable = true) {
    for (const listener of this.uploadListeners.progress ?? []) {
      listener({ loaded, total, lengthComputable } as ProgressEvent);
    }
  }
  respond(status: number, body: unknown, statusText = '') {
    this.status = status;
    this.statusText = statusText;
    this.responseText = body === undefined ? '' : JSON.stringify(body);
    this.responseHeaders['content-type'] = 'application/json; charset=utf-8';
    this.emit('load');
  }
  failNetwork() {
    this.emit('error');
  }
  private emit(type: string) {
    for (const listener of this.listeners[type] ?? []) listener({} as ProgressEvent);
  }
}

function formWithFile(): FormData {
  const form = new FormData();
  form.append('name', 'north station');
  form.append('file', new Blob(['Time,Temp\n2026-01-01 00:00,-3\n'], { type: 'text/csv' }), 'log.csv');
  return form;
}

afterEach(() => {
  vi.unstubAllGlobals();
  FakeXhr.last = null;
});

describe('uploadWithProgress', () => {
  it('sends the form with the bearer token, reports progress and resolves with the JSON body', async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    tokenStorage.set('token-abc');
    const seen: UploadProgress[] = [];
    const form = formWithFile();
    const done = uploadWithProgress<{ id: number }>('/api/farms/1/temperature-logs', form, {
      onProgress: (progress) => seen.push(progress),
    });
    const xhr = FakeXhr.last!;
    expect(xhr.method).toBe('POST');
    expect(xhr.url).toBe('/api/farms/1/temperature-logs');
    expect(xhr.headers.Authorization).toBe('Bearer token-abc');
    // The browser sets the multipart boundary: no Content-Type of our own.
    expect(xhr.headers['Content-Type']).toBeUndefined();
    expect(xhr.body).toBe(form);

    xhr.progress(250, 1000);
    xhr.progress(1000, 1000);
    xhr.respond(201, { id: 9 });

    await expect(done).resolves.toEqual({ id: 9 });
    expect(seen).toEqual([
      { loadedBytes: 250, totalBytes: 1000, fraction: 0.25 },
      { loadedBytes: 1000, totalBytes: 1000, fraction: 1 },
    ]);
  });

  it('reports an unknown total as a null fraction', async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    const seen: UploadProgress[] = [];
    const done = uploadWithProgress('/api/x', formWithFile(), { onProgress: (progress) => seen.push(progress) });
    FakeXhr.last!.progress(512, 0, false);
    FakeXhr.last!.respond(200, {});
    await done;
    expect(seen).toEqual([{ loadedBytes: 512, totalBytes: null, fraction: null }]);
  });

  it("turns a 422 with line-numbered details into the API's one error shape", async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    const done = uploadWithProgress('/api/farms/1/temperature-logs', formWithFile());
    FakeXhr.last!.respond(422, {
      statusCode: 422,
      error: 'Unprocessable Entity',
      message: '2 problems in the temperature file',
      field: 'file',
      details: [
        { field: 'line 3', message: "the temperature 'abc' is not a number" },
        { field: 'line 5', message: "'not a date' is not a date" },
      ],
    });
    const error = await done.catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).status).toBe(422);
    expect((error as ApiError).details.map((detail) => detail.field)).toEqual(['line 3', 'line 5']);
  });

  it('forgets the token on 401, as every other request does', async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    tokenStorage.set('expired');
    const done = uploadWithProgress('/api/x', formWithFile());
    FakeXhr.last!.respond(401, { statusCode: 401, error: 'Unauthorized', message: 'Sign in again' });
    await expect(done).rejects.toMatchObject({ status: 401 });
    expect(tokenStorage.get()).toBeNull();
  });

  it('says the server cannot be reached on a network error, and rejects with AbortError when cancelled', async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    const failing = uploadWithProgress('/api/x', formWithFile());
    FakeXhr.last!.failNetwork();
    await expect(failing).rejects.toMatchObject({ status: 0 });

    const controller = new AbortController();
    const cancelled = uploadWithProgress('/api/x', formWithFile(), { signal: controller.signal });
    controller.abort();
    await expect(cancelled).rejects.toMatchObject({ name: 'AbortError' });
    expect(FakeXhr.last!.aborted).toBe(true);
  });
});

describe('downloadFile', () => {
  const csvAnswer = () =>
    new Response('house,month\nA,9\n', {
      status: 200,
      headers: {
        'content-type': 'text/csv; charset=utf-8',
        'content-disposition': 'attachment; filename="season-budget-farm-1-us.csv"',
      },
    });
  const csvOfFarm1 = () =>
    client.GET('/api/farms/{farmId}/season-budget.csv', {
      params: { path: { farmId: 1 }, query: { units: 'us' } },
      parseAs: 'blob',
    });

  it('fetches through the client with the token and names the file from Content-Disposition', async () => {
    tokenStorage.set('token-csv');
    const fetchMock = vi.fn(async (_request: Request) => csvAnswer());
    vi.stubGlobal('fetch', fetchMock);
    const file = await downloadFile(csvOfFarm1(), 'fallback.csv');
    expect(file.fileName).toBe('season-budget-farm-1-us.csv');
    expect(await file.blob.text()).toContain('house,month');
    const request = fetchMock.mock.calls[0]![0];
    expect(new URL(request.url).pathname + new URL(request.url).search).toBe('/api/farms/1/season-budget.csv?units=us');
    expect(request.headers.get('Authorization')).toBe('Bearer token-csv');
  });

  it('falls back to the given name without Content-Disposition', async () => {
    vi.stubGlobal('fetch', async () => new Response('x', { status: 200, headers: { 'content-type': 'text/csv' } }));
    expect((await downloadFile(csvOfFarm1(), 'fallback.csv')).fileName).toBe('fallback.csv');
  });

  it('rejects with the API error, and forgets the token on 401', async () => {
    tokenStorage.set('expired');
    vi.stubGlobal(
      'fetch',
      async () =>
        new Response(JSON.stringify({ statusCode: 401, message: 'Sign in again' }), {
          status: 401,
          headers: { 'content-type': 'application/json' },
        }),
    );
    await expect(downloadFile(csvOfFarm1(), 'fallback.csv')).rejects.toMatchObject({
      name: 'ApiError',
      status: 401,
      message: 'Sign in again',
    });
    expect(tokenStorage.get()).toBeNull();
  });
});
