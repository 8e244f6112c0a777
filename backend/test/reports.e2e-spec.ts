import { ReceivedMail } from '../src/mail/models/received-mail.model';
import type { Response } from 'superagent';
import { pdfText } from './pdf-text';
import { bearer, createTestApp, signIn, type TestApp, ifMatch, versionOf } from './test-app';

/** Binary bodies (PDF) as a Buffer. */
const binary = (res: Response, callback: (error: Error | null, body: Buffer) => void) => {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  stream.on('end', () => callback(null, Buffer.concat(chunks)));
};

const squash = (text: string) => text.replace(/\s/g, '');

describe('heater-sizing reports (e2e)', () => {
  let t: TestApp;
  let adviser: string;
  let owner: string;
  let viewerlessGrower: string;
  let farmId: number;
  let houseId: number;
  let report: {
    id: number;
    snapshot: {
      house: { name: string; widthM: number };
      heating: { heater: { requiredOutputW: number }; assumptions: Array<{ source: string }> };
      season: { status: string };
    };
  };

  beforeAll(async () => {
    t = await createTestApp();
    adviser = await signIn(t, 'adviser@example.com');
    owner = await signIn(t, 'owner@example.com');
    viewerlessGrower = await signIn(t, 'grower@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(owner)).expect(200)).body[0].id;
    houseId = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(owner)).expect(200)).body[0].id;
  });
  afterAll(() => t.close());

  it('saves a snapshot that a later house edit does not change', async () => {
    const created = await t.http
      .post(`/api/houses/${houseId}/reports`)
      .set(bearer(adviser))
      .send({ title: 'Heater sizing', notes: 'Checked on site.\n\nSecond paragraph.', recommendations: 'Add a unit.' })
      .expect(201);
    report = created.body;
    expect(created.body.status).toBe('draft');
    expect(created.body.authorName).toBeTruthy();
    const before = report.snapshot;
    expect(before.heating.heater.requiredOutputW).toBeGreaterThan(0);
    expect(before.heating.assumptions.length).toBeGreaterThan(3);

    await t.http
      .patch(`/api/houses/${houseId}`)
      .set(bearer(owner))
      .set(ifMatch(await versionOf(t, owner, `/api/houses/${houseId}`)))
      .send({ name: 'Renamed after the report', widthM: before.house.widthM + 3 })
      .expect(200);
    const after = (await t.http.get(`/api/reports/${report.id}`).set(bearer(adviser)).expect(200)).body;
    expect(after.snapshot).toEqual(before);
    expect(after.houseName).toBe(before.house.name);
    // a report made now sees the edit
    const fresh = (
      await t.http
        .post(`/api/houses/${houseId}/reports`)
        .set(bearer(owner))
        .send({ title: 'After the edit' })
        .expect(201)
    ).body;
    expect(fresh.snapshot.house.name).toBe('Renamed after the report');
    expect(fresh.snapshot.heating.heater.requiredOutputW).toBeGreaterThan(before.heating.heater.requiredOutputW);
  });

  it('lists reports per house and per farm, readable by growers and viewers', async () => {
    const perHouse = (await t.http.get(`/api/houses/${houseId}/reports`).set(bearer(viewerlessGrower)).expect(200))
      .body;
    expect(perHouse.map((r: { id: number }) => r.id)).toContain(report.id);
    const perFarm = (await t.http.get(`/api/farms/${farmId}/reports`).set(bearer(owner)).expect(200)).body;
    expect(perFarm.length).toBe(2);
    await t.http.get(`/api/reports/${report.id}`).set(bearer(viewerlessGrower)).expect(200);
    await t.http.patch(`/api/reports/${report.id}`).set(bearer(viewerlessGrower)).send({ notes: 'x' }).expect(403);
  });

  it('renders a PDF in the reader units with the house name, the required output and every assumption source', async () => {
    await t.http.patch('/api/users/me').set(bearer(adviser)).send({ unitSystem: 'us' }).expect(200);
    const res = await t.http
      .get(`/api/reports/${report.id}.pdf`)
      .set(bearer(adviser))
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const text = await pdfText(pdf);
    expect(text).toContain(report.snapshot.house.name);
    // required output in Btu/h: W ÷ (1055.05585262 J/Btu ÷ 3600 s/h), International Table Btu
    const btuPerHour = Math.round(report.snapshot.heating.heater.requiredOutputW / (1055.05585262 / 3600));
    expect(text).toContain(`${btuPerHour.toLocaleString('en-US')} Btu/h`);
    // line wrapping inside table cells adds spaces (even inside long URLs): compare without whitespace
    const bare = text.replace(/\s/g, '');
    for (const assumption of report.snapshot.heating.assumptions) expect(bare).toContain(squash(assumption.source));
    expect(text).toMatch(/carbon monoxide/i);
    expect(text).toMatch(/ethylene/i);
    expect(text).toMatch(/Page 1 of \d+/);
    expect(text).toContain('Checked on site.');

    await t.http.patch('/api/users/me').set(bearer(adviser)).send({ unitSystem: 'si' }).expect(200);
    const si = await t.http
      .get(`/api/reports/${report.id}.pdf`)
      .set(bearer(adviser))
      .buffer(true)
      .parse(binary)
      .expect(200);
    const kw = (report.snapshot.heating.heater.requiredOutputW / 1000).toFixed(1);
    expect(await pdfText(si.body as Buffer)).toContain(`${kw} kW`);
  });

  it('keeps an issued report read-only; a new revision is an editable copy', async () => {
    await t.http.post(`/api/reports/${report.id}/issue`).set(bearer(adviser)).expect(200);
    const refused = await t.http
      .patch(`/api/reports/${report.id}`)
      .set(bearer(adviser))
      .send({ notes: 'late' })
      .expect(409);
    expect(refused.body.message).toMatch(/new revision/);
    const revision = (await t.http.post(`/api/reports/${report.id}/revisions`).set(bearer(adviser)).expect(201)).body;
    expect(revision).toMatchObject({ status: 'draft', revision: 2, previousReportId: report.id });
    expect(revision.snapshot).toEqual(report.snapshot);
    await t.http.patch(`/api/reports/${revision.id}`).set(bearer(adviser)).send({ notes: 'Revised.' }).expect(200);
  });

  it('e-mails the PDF to a member and an address through the local SMTP server', async () => {
    const members = (await t.http.get(`/api/farms/${farmId}/members`).set(bearer(owner)).expect(200)).body;
    const ownerMember = members.find((m: { email: string }) => m.email === 'owner@example.com');
    const sent = (
      await t.http
        .post(`/api/reports/${report.id}/send`)
        .set(bearer(adviser))
        .send({ memberUserIds: [ownerMember.userId], emails: ['Client.Office@example.org'], message: 'As discussed.' })
        .expect(200)
    ).body;
    expect(sent).toMatchObject({ status: 'sent', error: null });
    expect(sent.recipients.sort()).toEqual(['client.office@example.org', 'owner@example.com']);
    const mail = (await ReceivedMail.findAll({ order: [['id', 'DESC']], include: ['attachments'] }))[0]!;
    expect(mail.recipients.sort()).toEqual(['client.office@example.org', 'owner@example.com']);
    expect(mail.text).toContain('As discussed.');
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0]!.contentType).toBe('application/pdf');
    expect(Buffer.from(mail.attachments[0]!.content).subarray(0, 5).toString('latin1')).toBe('%PDF-');

    await t.http
      .post(`/api/reports/${report.id}/send`)
      .set(bearer(adviser))
      .send({ emails: ['not an address'] })
      .expect(400);
    await t.http.post(`/api/reports/${report.id}/send`).set(bearer(adviser)).send({}).expect(400);
    await t.http
      .post(`/api/reports/${report.id}/send`)
      .set(bearer(adviser))
      .send({ memberUserIds: [999999] })
      .expect(400);
  });

  it("lists the adviser's client farms with the newest report", async () => {
    const clients = (await t.http.get('/api/advising').set(bearer(adviser)).expect(200)).body;
    expect(clients).toHaveLength(1);
    expect(clients[0]).toMatchObject({ farmId });
    expect(clients[0].latestReport.id).toBeGreaterThan(report.id);
    expect((await t.http.get('/api/advising').set(bearer(owner)).expect(200)).body).toEqual([]);
  });

  it('keeps a report of a deleted house readable, and refuses a new one', async () => {
    await t.http.delete(`/api/houses/${houseId}`).set(bearer(owner)).expect(204);
    const kept = (await t.http.get(`/api/reports/${report.id}`).set(bearer(adviser)).expect(200)).body;
    expect(kept.houseId).toBeNull();
    expect(kept.snapshot).toEqual(report.snapshot);
    await t.http.post(`/api/houses/${houseId}/reports`).set(bearer(adviser)).send({ title: 'Gone' }).expect(404);
  });
});
