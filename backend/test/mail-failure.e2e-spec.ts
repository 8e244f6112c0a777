import { MailService } from '../src/mail/mail.service';
import { bearer, createTestApp, signIn, type TestApp } from './test-app';

// Its own file: the app reads its environment once per spec file.
describe('mail when the SMTP server is down (e2e)', () => {
  let t: TestApp;

  beforeAll(async () => {
    // port 9 on this machine: nothing listens there, so the connection is refused at once
    t = await createTestApp({ SMTP_URL: 'smtp://127.0.0.1:9' });
  });
  afterAll(() => t.close());

  it('keeps the failed send with its reason and text, and tells the caller', async () => {
    const result = await t.app.get(MailService).send({
      kind: 'test',
      to: ['owner@example.com'],
      subject: 'Will not go',
      text: 'Body kept anyway',
    });
    expect(result.status).toBe('failed');
    expect(result.error).toMatch(/cannot be reached/);
    const admin = await signIn(t, 'admin@example.com');
    const outbox = (await t.http.get('/api/mail/outbox').set(bearer(admin)).expect(200)).body;
    expect(outbox.localServer).toBe(false);
    expect(outbox.messages).toEqual([]);
    expect(outbox.failedSends[0]).toMatchObject({ subject: 'Will not go', text: 'Body kept anyway', status: 'failed' });
    expect(outbox.failedSends[0].error).toMatch(/cannot be reached/);
  });
});
