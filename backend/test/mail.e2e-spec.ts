import { MailService } from '../src/mail/mail.service';
import { bearer, createTestApp, signIn, type TestApp } from './test-app';

describe('mail through the local SMTP server (e2e)', () => {
  let t: TestApp;
  let admin: string;
  let owner: string;
  let grower: string;

  beforeAll(async () => {
    t = await createTestApp();
    admin = await signIn(t, 'admin@example.com');
    owner = await signIn(t, 'owner@example.com');
    grower = await signIn(t, 'grower@example.com');
  });
  afterAll(() => t.close());

  it('keeps a message sent over SMTP, parsed, with its attachment, for the admin and the recipient', async () => {
    const content = Buffer.from('season,fuel\n2027,1234\n');
    const result = await t.app.get(MailService).send({
      kind: 'test',
      to: ['Owner@Example.com'],
      subject: 'Fuel figures',
      text: 'Here are the figures.\nLine two.',
      attachments: [{ fileName: 'fuel.csv', contentType: 'text/csv', content }],
    });
    expect(result).toMatchObject({ status: 'sent', error: null });

    const outbox = (await t.http.get('/api/mail/outbox').set(bearer(admin)).expect(200)).body;
    expect(outbox.localServer).toBe(true);
    const message = outbox.messages.find((m: { subject: string }) => m.subject === 'Fuel figures');
    expect(message.recipients).toEqual(['owner@example.com']);
    expect(message.from).toMatch(/no-reply@thermbay\.localhost/);
    expect(message.text).toContain('Line two.');
    expect(message.attachments).toEqual([expect.objectContaining({ fileName: 'fuel.csv', sizeBytes: content.length })]);

    const url = `/api/mail/messages/${message.id}/attachments/${message.attachments[0].id}`;
    const download = await t.http.get(url).set(bearer(owner)).expect(200);
    expect(download.headers['content-disposition']).toContain('fuel.csv');
    expect(download.text).toBe(content.toString());
    await t.http.get(url).set(bearer(admin)).expect(200);
    // not a recipient: as if it did not exist
    await t.http.get(url).set(bearer(grower)).expect(404);

    const ownerInbox = (await t.http.get('/api/mail/inbox').set(bearer(owner)).expect(200)).body;
    expect(ownerInbox.map((m: { subject: string }) => m.subject)).toContain('Fuel figures');
    const growerInbox = (await t.http.get('/api/mail/inbox').set(bearer(grower)).expect(200)).body;
    expect(growerInbox.map((m: { subject: string }) => m.subject)).not.toContain('Fuel figures');
  });

  it('shows the outbox to the site admin only', async () => {
    await t.http.get('/api/mail/outbox').set(bearer(owner)).expect(403);
    await t.http.get('/api/mail/outbox').expect(401);
  });
});
