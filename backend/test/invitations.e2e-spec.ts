import { Invitation } from '../src/invitations/models/invitation.model';
import { bearer, createTestApp, linkTokenFromMail, signIn, type TestApp } from './test-app';

describe('invitations by e-mail (e2e)', () => {
  let t: TestApp;
  let owner: string;
  let farmId: number;

  const invite = (email: string, role = 'adviser') =>
    t.http.post(`/api/farms/${farmId}/invitations`).set(bearer(owner)).send({ email, role });

  beforeAll(async () => {
    t = await createTestApp();
    owner = await signIn(t, 'owner@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(owner)).expect(200)).body[0].id;
  });
  afterAll(() => t.close());

  it('answers the same for an address with or without an account', async () => {
    const withAccount = (await invite('admin@example.com', 'viewer').expect(201)).body;
    const without = (await invite('stranger@example.org', 'viewer').expect(201)).body;
    expect(Object.keys(withAccount).sort()).toEqual(Object.keys(without).sort());
    expect(withAccount.mail).toEqual({ status: 'sent', error: null });
    expect(without.mail).toEqual({ status: 'sent', error: null });
    await invite('not-an-address').expect(400);
    await invite('grower@example.com').expect(400); // already a member: the members list shows that anyway
  });

  it('signs a new person up through the link, once, and they see the farm', async () => {
    await invite('new.adviser@example.org').expect(201);
    const token = await linkTokenFromMail(t, 'new.adviser@example.org', '/invitations/');
    const preview = (await t.http.get(`/api/invitations/${token}`).expect(200)).body;
    expect(preview).toMatchObject({ email: 'new.adviser@example.org', role: 'adviser', accountExists: false });
    expect(preview.farmName).toBeTruthy();

    const weak = await t.http.post(`/api/invitations/${token}/sign-up`).send({ name: 'Ada', password: 'short' });
    expect(weak.status).toBe(400);
    const session = await t.http
      .post(`/api/invitations/${token}/sign-up`)
      .send({ name: 'Ada Adviser', password: 'ada-long-password' })
      .expect(201);
    expect(session.body.user.email).toBe('new.adviser@example.org');
    const farms = (await t.http.get('/api/farms').set(bearer(session.body.accessToken)).expect(200)).body;
    expect(farms.map((f: { id: number; myRole: string }) => [f.id, f.myRole])).toEqual([[farmId, 'adviser']]);

    // single use
    await t.http.get(`/api/invitations/${token}`).expect(404);
    await t.http
      .post(`/api/invitations/${token}/sign-up`)
      .send({ name: 'Again', password: 'another-long-password' })
      .expect(404);
  });

  it('adds the membership to an existing account after sign-in, only for the invited address', async () => {
    await t.http
      .post('/api/auth/register')
      .send({ email: 'existing@example.org', password: 'existing-password', name: 'Existing' })
      .expect(201);
    await invite('existing@example.org', 'viewer').expect(201);
    const token = await linkTokenFromMail(t, 'existing@example.org', '/invitations/');
    expect((await t.http.get(`/api/invitations/${token}`).expect(200)).body.accountExists).toBe(true);
    await t.http
      .post(`/api/invitations/${token}/sign-up`)
      .send({ name: 'X', password: 'existing-password-2' })
      .expect(409);
    const someoneElse = await signIn(t, 'grower@example.com');
    await t.http.post(`/api/invitations/${token}/accept`).set(bearer(someoneElse)).expect(403);
    const existing = await signIn(t, 'existing@example.org', 'existing-password');
    const accepted = (await t.http.post(`/api/invitations/${token}/accept`).set(bearer(existing)).expect(200)).body;
    expect(accepted).toEqual({ farmId, role: 'viewer' });
    await t.http.get(`/api/farms/${farmId}`).set(bearer(existing)).expect(200);
    await t.http.post(`/api/invitations/${token}/accept`).set(bearer(existing)).expect(404);
  });

  it('lists pending invitations; revoke and resend change which link works', async () => {
    const first = (await invite('pending.person@example.org', 'grower').expect(201)).body;
    const firstToken = await linkTokenFromMail(t, 'pending.person@example.org', '/invitations/');
    const pending = (await t.http.get(`/api/farms/${farmId}/invitations`).set(bearer(owner)).expect(200)).body;
    expect(pending.map((i: { email: string }) => i.email)).toContain('pending.person@example.org');

    const resent = (
      await t.http.post(`/api/farms/${farmId}/invitations/${first.id}/resend`).set(bearer(owner)).expect(200)
    ).body;
    expect(resent.mail.status).toBe('sent');
    const secondToken = await linkTokenFromMail(t, 'pending.person@example.org', '/invitations/');
    expect(secondToken).not.toBe(firstToken);
    await t.http.get(`/api/invitations/${firstToken}`).expect(404);
    await t.http.get(`/api/invitations/${secondToken}`).expect(200);

    await t.http.delete(`/api/farms/${farmId}/invitations/${first.id}`).set(bearer(owner)).expect(204);
    await t.http.get(`/api/invitations/${secondToken}`).expect(404);
    const after = (await t.http.get(`/api/farms/${farmId}/invitations`).set(bearer(owner)).expect(200)).body;
    expect(after.map((i: { email: string }) => i.email)).not.toContain('pending.person@example.org');
  });

  it('refuses a link after its 7 days', async () => {
    const sent = (await invite('late.person@example.org', 'viewer').expect(201)).body;
    expect(new Date(sent.expiresAt).getTime() - Date.now()).toBeGreaterThan(6.9 * 24 * 3600 * 1000);
    const token = await linkTokenFromMail(t, 'late.person@example.org', '/invitations/');
    // age the stored invitation instead of waiting a week
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: sent.id } });
    const res = await t.http
      .post(`/api/invitations/${token}/sign-up`)
      .send({ name: 'Late', password: 'late-long-password' })
      .expect(404);
    expect(res.body.message).toMatch(/expired/);
    const pending = (await t.http.get(`/api/farms/${farmId}/invitations`).set(bearer(owner)).expect(200)).body;
    expect(pending.find((i: { id: number }) => i.id === sent.id).expired).toBe(true);
  });
});
