import { hourlyCsv, HOURLY_MAPPING } from './temperature-csv';
import { houseBody as houseBodyNamed } from './fixtures';
import { bearer, createTestApp, ifMatch, joinByInvitation, signIn, type TestApp } from './test-app';

/**
 * The role × route matrix: every farm role, a member of another farm and the site admin
 * (who is not a member of the demo farm) against every farm and house route.
 */
type Who = 'owner' | 'grower' | 'adviser' | 'viewer' | 'outsider' | 'admin';
const WHO: Who[] = ['owner', 'grower', 'adviser', 'viewer', 'outsider', 'admin'];

const houseBody = houseBodyNamed('Matrix house');

describe('roles × routes (e2e)', () => {
  let t: TestApp;
  const token: Record<Who, string> = {} as Record<Who, string>;
  let farmId: number;
  let houseId: number;

  beforeAll(async () => {
    t = await createTestApp();
    for (const who of ['owner', 'grower', 'adviser', 'admin'] as const)
      token[who] = await signIn(t, `${who}@example.com`);
    for (const who of ['viewer', 'outsider'] as const) {
      const res = await t.http
        .post('/api/auth/register')
        .send({ email: `${who}@example.org`, password: 'member-pass-8472', name: who })
        .expect(201);
      token[who] = res.body.accessToken;
    }
    const farms = await t.http.get('/api/farms').set(bearer(token.owner)).expect(200);
    farmId = farms.body[0].id;
    await joinByInvitation(t, token.owner, farmId, 'viewer@example.org', 'viewer', token.viewer);
    // the outsider is a member (owner) of a farm of their own
    await t.http
      .post('/api/farms')
      .set(bearer(token.outsider))
      .send({ name: 'Elsewhere', latitudeDeg: 40, longitudeDeg: -80, elevationM: 200, timeZone: 'America/New_York' })
      .expect(201);
    const houses = await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(token.owner)).expect(200);
    houseId = houses.body[0].id;
  });
  afterAll(() => t.close());

  /** The version a member would have loaded before saving (read as the owner, who reads everything). */
  const versionOf = async (path: string) =>
    (await t.http.get(path).set(bearer(token.owner)).expect(200)).body.version as number;

  const newHouse = async () =>
    (await t.http.post(`/api/farms/${farmId}/houses`).set(bearer(token.owner)).send(houseBody).expect(201)).body
      .id as number;

  /** A fresh draft report for each call (its snapshot runs the season once). */
  const newReport = async () =>
    (
      await t.http
        .post(`/api/houses/${houseId}/reports`)
        .set(bearer(token.adviser))
        .send({ title: 'matrix report' })
        .expect(201)
    ).body.id as number;

  let invitationCount = 0;
  const newInvitation = async () =>
    (
      await t.http
        .post(`/api/farms/${farmId}/invitations`)
        .set(bearer(token.owner))
        .send({ email: `pending-${++invitationCount}@example.org`, role: 'grower' })
        .expect(201)
    ).body.id as number;

  const newAlternative = async () =>
    (
      await t.http
        .post(`/api/houses/${houseId}/alternatives`)
        .set(bearer(token.owner))
        .send({ name: 'Matrix alternative', patch: { coverings: { roof: 'poly-double-inflated' } } })
        .expect(201)
    ).body.id as number;

  const SEASON = { startDate: '2026-12-01', endDate: '2027-02-28' };
  const smallCsv = Buffer.from(hourlyCsv('2027-01-01', 2));
  const uploadLog = (who: Who) =>
    t.http
      .post(`/api/farms/${farmId}/temperature-logs`)
      .set(bearer(token[who]))
      .field('name', `log by ${who}`)
      .field('mapping', JSON.stringify(HOURLY_MAPPING))
      .attach('file', smallCsv, { filename: 'log.csv', contentType: 'text/csv' });
  const newLog = async () => (await uploadLog('owner').expect(201)).body.id as number;
  let registered = 0;
  /** A fresh account, registered through the API; returns its id. */
  const newUser = async (label: string) => {
    registered += 1;
    const email = `${label}-${registered}@example.org`;
    const res = await t.http
      .post('/api/auth/register')
      .send({ email, password: 'member-pass-8472', name: email })
      .expect(201);
    return { id: res.body.user.id as number, email, token: res.body.accessToken as string };
  };
  /** A fresh account added to the demo farm by its owner with the given role. */
  const newMember = async (role: 'viewer' | 'grower' = 'viewer') => {
    const user = await newUser('member');
    await joinByInvitation(t, token.owner, farmId, user.email, role, user.token);
    return user.id;
  };
  /** A fresh farm owned by the owner, with the grower, adviser and viewer as members in those roles. */
  const newSharedFarm = async () => {
    const farm = (
      await t.http
        .post('/api/farms')
        .set(bearer(token.owner))
        .send({ name: 'Shared', latitudeDeg: 44, longitudeDeg: -93, elevationM: 280, timeZone: 'America/Chicago' })
        .expect(201)
    ).body;
    for (const [who, email, role] of [
      ['grower', 'grower@example.com', 'grower'],
      ['adviser', 'adviser@example.com', 'adviser'],
      ['viewer', 'viewer@example.org', 'viewer'],
    ] as const) {
      await joinByInvitation(t, token.owner, farm.id, email, role, token[who]);
    }
    return farm.id as number;
  };
  const demoPrices = [
    { fuelId: 'propane', pricePerUnit: 1.6, priceUnit: 'us', note: 'Invented demo price per US gal, not market data' },
    {
      fuelId: 'natural-gas',
      pricePerUnit: 0.8,
      priceUnit: 'us',
      note: 'Invented demo price per therm, not market data',
    },
  ];

  const matrix: Array<{
    route: string;
    expected: Record<Who, number>;
    call: (who: Who) => Promise<{ status: number }>;
  }> = [
    {
      route: 'GET /farms/:id',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}`).set(bearer(token[who])),
    },
    {
      route: 'PATCH /farms/:id',
      expected: { owner: 200, grower: 403, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http
          .patch(`/api/farms/${farmId}`)
          .set(bearer(token[who]))
          .set(ifMatch(await versionOf(`/api/farms/${farmId}`)))
          .send({ elevationM: 314 + WHO.indexOf(who) }),
    },
    {
      route: 'GET /farms/:id/members',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}/members`).set(bearer(token[who])),
    },
    {
      route: 'GET /farms/:id/houses',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}/houses`).set(bearer(token[who])),
    },
    {
      route: 'POST /farms/:id/houses',
      expected: { owner: 201, grower: 201, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: (who) => t.http.post(`/api/farms/${farmId}/houses`).set(bearer(token[who])).send(houseBody),
    },
    {
      route: 'GET /houses/:id',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/houses/${houseId}`).set(bearer(token[who])),
    },
    {
      route: 'PATCH /houses/:id',
      expected: { owner: 200, grower: 200, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http
          .patch(`/api/houses/${houseId}`)
          .set(bearer(token[who]))
          .set(ifMatch(await versionOf(`/api/houses/${houseId}`)))
          .send({ notes: `edited by ${who}` }),
    },
    {
      route: 'DELETE /houses/:id',
      expected: { owner: 204, grower: 204, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => t.http.delete(`/api/houses/${await newHouse()}`).set(bearer(token[who])),
    },
    {
      route: 'POST /houses/:id/estimate',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: (who) => t.http.post(`/api/houses/${houseId}/estimate`).set(bearer(token[who])).send({}),
    },
    {
      route: 'POST /houses/:id/cooling',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: (who) => t.http.post(`/api/houses/${houseId}/cooling`).set(bearer(token[who])).send({}),
    },
    {
      route: 'POST /farms/:id/invitations',
      expected: { owner: 201, grower: 403, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: (who) =>
        t.http
          .post(`/api/farms/${farmId}/invitations`)
          .set(bearer(token[who]))
          .send({ email: `invitee-${who}@example.org`, role: 'viewer' }),
    },
    {
      route: 'GET /farms/:id/invitations',
      expected: { owner: 200, grower: 403, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}/invitations`).set(bearer(token[who])),
    },
    {
      route: 'POST /farms/:id/invitations/:id/resend',
      expected: { owner: 200, grower: 403, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http.post(`/api/farms/${farmId}/invitations/${await newInvitation()}/resend`).set(bearer(token[who])),
    },
    {
      route: 'DELETE /farms/:id/invitations/:id',
      expected: { owner: 204, grower: 403, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http.delete(`/api/farms/${farmId}/invitations/${await newInvitation()}`).set(bearer(token[who])),
    },
    {
      route: 'GET /farms/:id/temperature-logs',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}/temperature-logs`).set(bearer(token[who])),
    },
    {
      route: 'POST /farms/:id/temperature-logs/inspect',
      expected: { owner: 200, grower: 200, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: (who) =>
        t.http
          .post(`/api/farms/${farmId}/temperature-logs/inspect`)
          .set(bearer(token[who]))
          .attach('file', smallCsv, { filename: 'log.csv', contentType: 'text/csv' }),
    },
    {
      route: 'POST /farms/:id/temperature-logs',
      expected: { owner: 201, grower: 201, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: (who) => uploadLog(who),
    },
    {
      route: 'GET /temperature-logs/:id',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: async (who) => t.http.get(`/api/temperature-logs/${await newLog()}`).set(bearer(token[who])),
    },
    {
      route: 'DELETE /temperature-logs/:id',
      expected: { owner: 204, grower: 204, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => t.http.delete(`/api/temperature-logs/${await newLog()}`).set(bearer(token[who])),
    },
    {
      route: 'GET /houses/:id/calendar',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/houses/${houseId}/calendar`).set(bearer(token[who])),
    },
    {
      route: 'PUT /houses/:id/calendar',
      expected: { owner: 200, grower: 200, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http
          .put(`/api/houses/${houseId}/calendar`)
          .set(bearer(token[who]))
          .set(ifMatch(await versionOf(`/api/houses/${houseId}/calendar`)))
          .send({
            periods: [{ startMonthDay: '10-01', endMonthDay: '04-30', mode: 'heated', label: `set by ${who}` }],
          }),
    },
    {
      route: 'GET /farms/:id/climate',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}/climate`).set(bearer(token[who])),
    },
    {
      route: 'PUT /farms/:id/climate',
      expected: { owner: 200, grower: 200, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => {
        const loaded = (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(token.owner)).expect(200)).body;
        return t.http
          .put(`/api/farms/${farmId}/climate`)
          .set(bearer(token[who]))
          .set(ifMatch(loaded.version))
          .send({ ...loaded.climate, sourceNote: `invented demo climate, saved by ${who}` });
      },
    },
    {
      route: 'GET /farms/:id/fuel-prices',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}/fuel-prices`).set(bearer(token[who])),
    },
    {
      route: 'PUT /farms/:id/fuel-prices',
      expected: { owner: 200, grower: 200, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http
          .put(`/api/farms/${farmId}/fuel-prices`)
          .set(bearer(token[who]))
          .set(ifMatch(await versionOf(`/api/farms/${farmId}/fuel-prices`)))
          .send({ prices: demoPrices.map((p) => ({ ...p, note: `${p.note} (set by ${who})` })) }),
    },
    {
      route: 'POST /houses/:id/season',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: (who) => t.http.post(`/api/houses/${houseId}/season`).set(bearer(token[who])).send(SEASON),
    },
    {
      route: 'POST /houses/:id/night-demand',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: (who) =>
        t.http.post(`/api/houses/${houseId}/night-demand`).set(bearer(token[who])).send({ date: '2027-01-15' }),
    },
    {
      route: 'POST /houses/:id/measures',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: (who) =>
        t.http
          .post(`/api/houses/${houseId}/measures`)
          .set(bearer(token[who]))
          .send({ ...SEASON, measures: [{ kind: 'night-setpoint-lower', costAmount: 0 }] }),
    },
    {
      route: 'POST /farms/:id/season-budget',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.post(`/api/farms/${farmId}/season-budget`).set(bearer(token[who])).send(SEASON),
    },
    {
      route: 'GET /farms/:id/season-budget.csv',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) =>
        t.http
          .get(`/api/farms/${farmId}/season-budget.csv`)
          .query({ units: 'us', ...SEASON })
          .set(bearer(token[who])),
    },
    {
      route: 'GET /farms/:id/weather',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}/weather`).set(bearer(token[who])),
    },
    {
      route: 'POST /farms/:id/weather/years/:year',
      expected: { owner: 201, grower: 201, adviser: 201, viewer: 403, outsider: 404, admin: 404 },
      call: (who) => t.http.post(`/api/farms/${farmId}/weather/years/2024`).set(bearer(token[who])),
    },
    {
      route: 'POST /farms/:id/weather/years/:year/temperature-log',
      expected: { owner: 201, grower: 201, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: (who) => t.http.post(`/api/farms/${farmId}/weather/years/2024/temperature-log`).set(bearer(token[who])),
    },
    {
      route: 'GET /farms/:id/weather/climate-proposal',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: (who) =>
        t.http
          .get(`/api/farms/${farmId}/weather/climate-proposal`)
          .query({ fromYear: 2024, toYear: 2024 })
          .set(bearer(token[who])),
    },
    {
      // the matrix's log covers two days: every role let through is refused for the short log (422)
      route: 'GET /farms/:id/temperature-logs/:logId/climate-proposal',
      expected: { owner: 422, grower: 422, adviser: 422, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http.get(`/api/farms/${farmId}/temperature-logs/${await newLog()}/climate-proposal`).set(bearer(token[who])),
    },
    {
      route: 'DELETE /farms/:id (a farm the caller is a member of)',
      expected: { owner: 204, grower: 403, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => t.http.delete(`/api/farms/${await newSharedFarm()}`).set(bearer(token[who])),
    },
    {
      route: 'PATCH /farms/:id/members/:userId (role change)',
      expected: { owner: 200, grower: 403, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http
          .patch(`/api/farms/${farmId}/members/${await newMember()}`)
          .set(bearer(token[who]))
          .send({ role: 'adviser' }),
    },
    {
      route: 'DELETE /farms/:id/members/:userId',
      expected: { owner: 204, grower: 403, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => t.http.delete(`/api/farms/${farmId}/members/${await newMember()}`).set(bearer(token[who])),
    },
    {
      route: 'GET /farms/:id/climate',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}/climate`).set(bearer(token[who])),
    },
    {
      route: 'PUT /farms/:id/climate',
      expected: { owner: 200, grower: 200, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => {
        const loaded = (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(token.owner)).expect(200)).body;
        return t.http
          .put(`/api/farms/${farmId}/climate`)
          .set(bearer(token[who]))
          .set(ifMatch(loaded.version))
          .send({ ...loaded.climate, sourceNote: `entered by ${who}` });
      },
    },
    {
      route: 'PATCH /users/:id (site admin only)',
      expected: { owner: 403, grower: 403, adviser: 403, viewer: 403, outsider: 403, admin: 200 },
      call: async (who) =>
        t.http
          .patch(`/api/users/${(await newUser('renamed')).id}`)
          .set(bearer(token[who]))
          .send({ name: `renamed by ${who}` }),
    },
    {
      route: 'DELETE /users/:id (site admin only)',
      expected: { owner: 403, grower: 403, adviser: 403, viewer: 403, outsider: 403, admin: 204 },
      call: async (who) => t.http.delete(`/api/users/${(await newUser('deleted')).id}`).set(bearer(token[who])),
    },
    {
      route: 'POST /houses/:id/reports',
      expected: { owner: 201, grower: 403, adviser: 201, viewer: 403, outsider: 404, admin: 404 },
      call: (who) =>
        t.http
          .post(`/api/houses/${houseId}/reports`)
          .set(bearer(token[who]))
          .send({ title: `by ${who}` }),
    },
    {
      route: 'GET /houses/:id/reports',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/houses/${houseId}/reports`).set(bearer(token[who])),
    },
    {
      route: 'GET /farms/:id/reports',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}/reports`).set(bearer(token[who])),
    },
    {
      route: 'GET /reports/:id',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: async (who) => t.http.get(`/api/reports/${await newReport()}`).set(bearer(token[who])),
    },
    {
      route: 'GET /reports/:id.pdf',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: async (who) => t.http.get(`/api/reports/${await newReport()}.pdf`).set(bearer(token[who])),
    },
    {
      route: 'PATCH /reports/:id',
      expected: { owner: 200, grower: 403, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http
          .patch(`/api/reports/${await newReport()}`)
          .set(bearer(token[who]))
          .send({ notes: `by ${who}` }),
    },
    {
      route: 'POST /reports/:id/issue',
      expected: { owner: 200, grower: 403, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => t.http.post(`/api/reports/${await newReport()}/issue`).set(bearer(token[who])),
    },
    {
      route: 'POST /reports/:id/revisions',
      expected: { owner: 201, grower: 403, adviser: 201, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => t.http.post(`/api/reports/${await newReport()}/revisions`).set(bearer(token[who])),
    },
    {
      route: 'POST /reports/:id/send',
      expected: { owner: 200, grower: 403, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http
          .post(`/api/reports/${await newReport()}/send`)
          .set(bearer(token[who]))
          .send({ emails: ['client@example.org'] }),
    },
    {
      route: 'GET /advising',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 200, admin: 200 },
      call: (who) => t.http.get('/api/advising').set(bearer(token[who])),
    },
    {
      route: 'GET /mail/outbox (site admin only)',
      expected: { owner: 403, grower: 403, adviser: 403, viewer: 403, outsider: 403, admin: 200 },
      call: (who) => t.http.get('/api/mail/outbox').set(bearer(token[who])),
    },
    {
      route: 'GET /mail/inbox (own messages)',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 200, admin: 200 },
      call: (who) => t.http.get('/api/mail/inbox').set(bearer(token[who])),
    },
    {
      route: 'GET /houses/:id/alternatives',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/houses/${houseId}/alternatives`).set(bearer(token[who])),
    },
    {
      route: 'POST /houses/:id/alternatives',
      expected: { owner: 201, grower: 201, adviser: 201, viewer: 403, outsider: 404, admin: 404 },
      call: (who) =>
        t.http
          .post(`/api/houses/${houseId}/alternatives`)
          .set(bearer(token[who]))
          .send({ name: `proposal by ${who}`, patch: { perimeterInsulated: true } }),
    },
    {
      route: 'GET /alternatives/:id',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: async (who) => t.http.get(`/api/alternatives/${await newAlternative()}`).set(bearer(token[who])),
    },
    {
      route: 'PATCH /alternatives/:id',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http
          .patch(`/api/alternatives/${await newAlternative()}`)
          .set(bearer(token[who]))
          .send({ costAmount: 1000 }),
    },
    {
      route: 'DELETE /alternatives/:id',
      expected: { owner: 204, grower: 204, adviser: 204, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => t.http.delete(`/api/alternatives/${await newAlternative()}`).set(bearer(token[who])),
    },
    {
      route: 'POST /alternatives/:id/adopt',
      expected: { owner: 200, grower: 200, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => t.http.post(`/api/alternatives/${await newAlternative()}/adopt`).set(bearer(token[who])),
    },
    {
      route: 'POST /houses/:id/duplicate',
      expected: { owner: 201, grower: 201, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: (who) => t.http.post(`/api/houses/${houseId}/duplicate`).set(bearer(token[who])).send({}),
    },
    {
      route: 'POST /houses/:id/side-by-side',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) =>
        t.http
          .post(`/api/houses/${houseId}/side-by-side`)
          .set(bearer(token[who]))
          .send({ ...SEASON, alternativeIds: [await newAlternative()] }),
    },
    {
      route: 'GET /users (site admin only)',
      expected: { owner: 403, grower: 403, adviser: 403, viewer: 403, outsider: 403, admin: 200 },
      call: (who) => t.http.get('/api/users').set(bearer(token[who])),
    },
  ];

  for (const row of matrix) {
    for (const who of WHO) {
      it(`${row.route} as ${who} → ${row.expected[who]}`, async () => {
        const res = await row.call(who);
        expect(res.status).toBe(row.expected[who]);
      });
    }
  }

  it('never leaks another farm: the outsider sees only their own farm in the list', async () => {
    const res = await t.http.get('/api/farms').set(bearer(token.outsider)).expect(200);
    expect(res.body.map((f: { name: string }) => f.name)).toEqual(['Elsewhere']);
  });

  it('gives each farm the permission list of the caller’s role, from the one map', async () => {
    const map = (await t.http.get('/api/permissions').set(bearer(token.viewer)).expect(200)).body.roles;
    const viewerFarm = (await t.http.get(`/api/farms/${farmId}`).set(bearer(token.viewer)).expect(200)).body;
    expect(viewerFarm.myRole).toBe('viewer');
    expect(viewerFarm.permissions).toEqual(map.viewer);
    expect(map.grower).toContain('house:write');
    expect(map.adviser).not.toContain('house:write');
    expect(map.adviser).toContain('report:write');
    expect(map.adviser).toContain('alternative:write');
    expect(map.viewer).not.toContain('alternative:write');
  });

  it('only the owner deletes a farm, and its houses go with it', async () => {
    const farm = (
      await t.http
        .post('/api/farms')
        .set(bearer(token.grower))
        .send({ name: 'Temporary', latitudeDeg: 45, longitudeDeg: -94, elevationM: 300, timeZone: 'America/Chicago' })
        .expect(201)
    ).body;
    expect(farm.myRole).toBe('owner');
    const house = (
      await t.http.post(`/api/farms/${farm.id}/houses`).set(bearer(token.grower)).send(houseBody).expect(201)
    ).body;
    await t.http.delete(`/api/farms/${farm.id}`).set(bearer(token.viewer)).expect(404);
    await t.http.delete(`/api/farms/${farm.id}`).set(bearer(token.grower)).expect(204);
    await t.http.get(`/api/houses/${house.id}`).set(bearer(token.grower)).expect(404);
  });

  it('keeps at least one owner on a farm', async () => {
    const members = (await t.http.get(`/api/farms/${farmId}/members`).set(bearer(token.owner)).expect(200)).body;
    const owner = members.find((m: { role: string }) => m.role === 'owner');
    const res = await t.http
      .patch(`/api/farms/${farmId}/members/${owner.userId}`)
      .set(bearer(token.owner))
      .send({ role: 'viewer' })
      .expect(409);
    expect(res.body.message).toMatch(/at least one owner/);
  });

  it('refuses to remove the only owner of a farm, and the owner stays', async () => {
    const members = (await t.http.get(`/api/farms/${farmId}/members`).set(bearer(token.owner)).expect(200)).body;
    const owners = members.filter((m: { role: string }) => m.role === 'owner');
    expect(owners).toHaveLength(1);
    const res = await t.http
      .delete(`/api/farms/${farmId}/members/${owners[0].userId}`)
      .set(bearer(token.owner))
      .expect(409);
    expect(res.body.message).toMatch(/at least one owner/);
    const after = (await t.http.get(`/api/farms/${farmId}`).set(bearer(token.owner)).expect(200)).body;
    expect(after.myRole).toBe('owner');
  });

  it('a role change takes effect at once, and a removed member no longer sees the farm', async () => {
    const user = await newUser('promoted');
    await joinByInvitation(t, token.owner, farmId, user.email, 'viewer', user.token);
    const memberToken = user.token;
    await t.http.post(`/api/farms/${farmId}/houses`).set(bearer(memberToken)).send(houseBody).expect(403);
    const changed = await t.http
      .patch(`/api/farms/${farmId}/members/${user.id}`)
      .set(bearer(token.owner))
      .send({ role: 'grower' })
      .expect(200);
    expect(changed.body).toMatchObject({ userId: user.id, email: user.email, role: 'grower' });
    await t.http.post(`/api/farms/${farmId}/houses`).set(bearer(memberToken)).send(houseBody).expect(201);
    await t.http.delete(`/api/farms/${farmId}/members/${user.id}`).set(bearer(token.owner)).expect(204);
    await t.http.get(`/api/farms/${farmId}`).set(bearer(memberToken)).expect(404);
    const members = (await t.http.get(`/api/farms/${farmId}/members`).set(bearer(token.owner)).expect(200)).body;
    expect(members.map((m: { userId: number }) => m.userId)).not.toContain(user.id);
  });

  it('a second owner can be demoted once there is another, and an unknown member is 404', async () => {
    const user = await newUser('co-owner');
    await joinByInvitation(t, token.owner, farmId, user.email, 'grower', user.token);
    await t.http
      .patch(`/api/farms/${farmId}/members/${user.id}`)
      .set(bearer(token.owner))
      .send({ role: 'owner' })
      .expect(200);
    await t.http
      .patch(`/api/farms/${farmId}/members/${user.id}`)
      .set(bearer(token.owner))
      .send({ role: 'viewer' })
      .expect(200);
    await t.http
      .patch(`/api/farms/${farmId}/members/999999`)
      .set(bearer(token.owner))
      .send({ role: 'viewer' })
      .expect(404);
    await t.http.delete(`/api/farms/${farmId}/members/999999`).set(bearer(token.owner)).expect(404);
  });

  describe('site administration', () => {
    const adminId = async () =>
      (await t.http.get('/api/auth/me').set(bearer(token.admin)).expect(200)).body.id as number;

    it('an admin cannot remove their own administrator role, and stays an admin', async () => {
      const id = await adminId();
      const res = await t.http
        .patch(`/api/users/${id}`)
        .set(bearer(token.admin))
        .send({ siteRole: 'user' })
        .expect(400);
      expect(res.body.message).toMatch(/own administrator role/);
      await t.http.get('/api/users').set(bearer(token.admin)).expect(200);
      // renaming oneself is allowed
      await t.http.patch(`/api/users/${id}`).set(bearer(token.admin)).send({ name: 'Site admin' }).expect(200);
    });

    it('an admin cannot delete their own account through user administration', async () => {
      const id = await adminId();
      const res = await t.http.delete(`/api/users/${id}`).set(bearer(token.admin)).expect(400);
      expect(res.body.message).toMatch(/own account/);
      await t.http.get('/api/auth/me').set(bearer(token.admin)).expect(200);
    });

    it('an admin promotes and demotes someone else; the promoted user can then administer', async () => {
      const user = await newUser('promoted-admin');
      const promoted = await t.http
        .patch(`/api/users/${user.id}`)
        .set(bearer(token.admin))
        .send({ siteRole: 'admin' })
        .expect(200);
      expect(promoted.body).toMatchObject({ id: user.id, siteRole: 'admin' });
      const userToken = await signIn(t, user.email, 'member-pass-8472');
      await t.http.get('/api/users').set(bearer(userToken)).expect(200);
      await t.http.patch(`/api/users/${user.id}`).set(bearer(token.admin)).send({ siteRole: 'user' }).expect(200);
      await t.http
        .get('/api/users')
        .set(bearer(await signIn(t, user.email, 'member-pass-8472')))
        .expect(403);
    });

    it('a deleted account can no longer sign in, and an unknown id is 404', async () => {
      const user = await newUser('gone');
      await t.http.delete(`/api/users/${user.id}`).set(bearer(token.admin)).expect(204);
      await t.http.post('/api/auth/login').send({ email: user.email, password: 'member-pass-8472' }).expect(401);
      await t.http.delete('/api/users/999999').set(bearer(token.admin)).expect(404);
      await t.http.patch('/api/users/999999').set(bearer(token.admin)).send({ name: 'x' }).expect(404);
    });

    it('refuses a site role outside admin and user', async () => {
      const user = await newUser('bad-role');
      await t.http.patch(`/api/users/${user.id}`).set(bearer(token.admin)).send({ siteRole: 'owner' }).expect(400);
    });
  });
});
