import { bearer, createTestApp, signIn, type TestApp } from './test-app';

const directive = (policy: string, name: string): string[] =>
  (
    policy
      .split(';')
      .map((part) => part.trim().split(/\s+/))
      .find(([key]) => key === name) ?? []
  ).slice(1);

describe('security headers (e2e)', () => {
  let t: TestApp;
  let grower: string;

  beforeAll(async () => {
    t = await createTestApp();
    grower = await signIn(t, 'grower@example.com');
  });
  afterAll(() => t.close());

  it('sends a strict content security policy: scripts from the app only, never inline', async () => {
    for (const path of ['/api/health', '/api/farms', '/']) {
      const res = await t.http.get(path).set(bearer(grower));
      const policy = res.headers['content-security-policy'] as string;
      expect(directive(policy, 'script-src')).toEqual(["'self'"]);
      expect(directive(policy, 'script-src-attr')).toEqual(["'none'"]);
      expect(directive(policy, 'object-src')).toEqual(["'none'"]);
      expect(directive(policy, 'frame-ancestors')).toEqual(["'none'"]);
    }
  });

  it('relaxes it for inline scripts on the API documentation page only', async () => {
    for (const path of ['/api/docs', '/api/docs/']) {
      const res = await t.http.get(path).redirects(0);
      expect(directive(res.headers['content-security-policy'] as string, 'script-src')).toContain("'unsafe-inline'");
    }
    const elsewhere = await t.http.get('/api/docsx');
    expect(directive(elsewhere.headers['content-security-policy'] as string, 'script-src')).toEqual(["'self'"]);
  });

  it('marks answers to signed-in requests no-store, errors included', async () => {
    const farms = await t.http.get('/api/farms').set(bearer(grower)).expect(200);
    expect(farms.headers['cache-control']).toBe('no-store');
    const missing = await t.http.get('/api/houses/999999').set(bearer(grower)).expect(404);
    expect(missing.headers['cache-control']).toBe('no-store');
  });
});
