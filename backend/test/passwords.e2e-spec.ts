import { PasswordResetToken } from '../src/auth/models/password-reset-token.model';
import { ReceivedMail } from '../src/mail/models/received-mail.model';
import { bearer, createTestApp, signIn, type TestApp } from './test-app';

describe('passwords: change and reset by e-mail (e2e)', () => {
  let t: TestApp;
  const received = () => ReceivedMail.findAll({ order: [['id', 'DESC']] });
  const lastTokenFor = async (email: string): Promise<string> => {
    const mail = (await received()).find((m) => m.recipients.includes(email));
    const match = /\/reset-password\/([A-Za-z0-9_-]+)/.exec(mail?.text ?? '');
    if (!match) throw new Error(`no reset link in a message to ${email}`);
    return match[1]!;
  };

  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('refuses weak passwords at sign-up and says why', async () => {
    const cases: Array<[string, RegExp]> = [
      ['short-pw1', /at least 10 characters/],
      ['qwertyuiop', /most commonly used/],
      ['weak.person@example.org', /e-mail/],
      ['x'.repeat(73), /at most 72 bytes/],
    ];
    for (const [password, reason] of cases) {
      const res = await t.http
        .post('/api/auth/register')
        .send({ email: 'weak.person@example.org', password, name: 'Weak' })
        .expect(400);
      expect(res.body.details[0]).toEqual({ field: 'password', message: expect.stringMatching(reason) });
    }
  });

  it('changes the password knowing the current one and signs out every other session', async () => {
    await t.http
      .post('/api/auth/register')
      .send({ email: 'changer@example.org', password: 'first-long-password', name: 'Changer' })
      .expect(201);
    const laptop = await signIn(t, 'changer@example.org', 'first-long-password');
    const phone = await signIn(t, 'changer@example.org', 'first-long-password');
    await t.http
      .post('/api/auth/password')
      .set(bearer(laptop))
      .send({ currentPassword: 'not-the-password', newPassword: 'second-long-password' })
      .expect(400)
      .expect((res) => expect(res.body.details[0].field).toBe('currentPassword'));
    const refused = await t.http
      .post('/api/auth/password')
      .set(bearer(laptop))
      .send({ currentPassword: 'first-long-password', newPassword: '1234567890' })
      .expect(400);
    expect(refused.body.details[0]).toMatchObject({ field: 'newPassword' });
    const changed = await t.http
      .post('/api/auth/password')
      .set(bearer(laptop))
      .send({ currentPassword: 'first-long-password', newPassword: 'second-long-password' })
      .expect(200);
    await t.http.get('/api/auth/me').set(bearer(phone)).expect(401);
    await t.http.get('/api/auth/me').set(bearer(laptop)).expect(401);
    await t.http.get('/api/auth/me').set(bearer(changed.body.accessToken)).expect(200);
    await t.http
      .post('/api/auth/login')
      .send({ email: 'changer@example.org', password: 'first-long-password' })
      .expect(401);
    await signIn(t, 'changer@example.org', 'second-long-password');
    expect((await received())[0]!.subject).toMatch(/password was changed/);
  });

  it('answers a reset request the same whether or not the address has an account', async () => {
    const before = (await received()).length;
    const known = await t.http
      .post('/api/auth/password-reset/request')
      .send({ email: 'grower@example.com' })
      .expect(202);
    const unknown = await t.http
      .post('/api/auth/password-reset/request')
      .send({ email: 'nobody-here@example.com' })
      .expect(202);
    expect(unknown.body).toEqual(known.body);
    const after = await received();
    expect(after.length).toBe(before + 1);
    expect(after[0]!.recipients).toEqual(['grower@example.com']);
    await t.http.post('/api/auth/password-reset/request').send({ email: 'not an address' }).expect(400);
  });

  it('resets with the e-mailed link once, signing out every other session', async () => {
    const oldSession = await signIn(t, 'owner@example.com');
    await t.http.post('/api/auth/password-reset/request').send({ email: 'owner@example.com' }).expect(202);
    const token = await lastTokenFor('owner@example.com');
    const weak = await t.http.post('/api/auth/password-reset').send({ token, newPassword: 'password' }).expect(400);
    expect(weak.body.details[0].field).toBe('newPassword');
    const reset = await t.http
      .post('/api/auth/password-reset')
      .send({ token, newPassword: 'owner-new-secret-1' })
      .expect(200);
    await t.http.get('/api/auth/me').set(bearer(reset.body.accessToken)).expect(200);
    await t.http.get('/api/auth/me').set(bearer(oldSession)).expect(401);
    await signIn(t, 'owner@example.com', 'owner-new-secret-1');
    // single use
    const again = await t.http
      .post('/api/auth/password-reset')
      .send({ token, newPassword: 'owner-other-secret-2' })
      .expect(400);
    expect(again.body.message).toMatch(/not valid/);
    await t.http
      .post('/api/auth/password-reset')
      .send({ token: 'made-up-token-value', newPassword: 'x-long-enough-1' })
      .expect(400);
  });

  it('refuses a reset link after its hour', async () => {
    await t.http.post('/api/auth/password-reset/request').send({ email: 'adviser@example.com' }).expect(202);
    const token = await lastTokenFor('adviser@example.com');
    // age the stored token instead of waiting an hour
    const [aged] = await PasswordResetToken.update(
      { expiresAt: new Date(Date.now() - 1000) },
      { where: { usedAt: null } },
    );
    expect(aged).toBeGreaterThan(0);
    const res = await t.http
      .post('/api/auth/password-reset')
      .send({ token, newPassword: 'adviser-new-secret' })
      .expect(400);
    expect(res.body.message).toMatch(/expired/);
    await signIn(t, 'adviser@example.com');
  });
});
