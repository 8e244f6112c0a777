import { hourlyCsv, HOURLY_MAPPING } from './temperature-csv';
import { houseBody as houseBodyNamed } from './fixtures';
import { bearer, createTestApp, signIn, type TestApp } from './test-app';

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
        .send({ email: `${who}@example.org`, password: 'password-123', name: who })
        .expect(201);
      token[who] = res.body.accessToken;
    }
    const farms = await t.http.get('/api/farms').set(bearer(token.owner)).expect(200);
    farmId = farms.body[0].id;
    await t.http
      .post(`/api/farms/${farmId}/members`)
      .set(bearer(token.owner))
      .send({ email: 'viewer@example.org', role: 'viewer' })
      .expect(201);
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

  const newHouse = async () =>
    (await t.http.post(`/api/farms/${farmId}/houses`).set(bearer(token.owner)).send(houseBody).expect(201)).body
      .id as number;

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
      call: (who) => t.http.patch(`/api/farms/${farmId}`).set(bearer(token[who])).send({ elevationM: 314 }),
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
      call: (who) =>
        t.http
          .patch(`/api/houses/${houseId}`)
          .set(bearer(token[who]))
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
      route: 'POST /farms/:id/members',
      expected: { owner: 201, grower: 403, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: async (who) => {
        const email = `invitee-${who}@example.org`;
        await t.http.post('/api/auth/register').send({ email, password: 'password-123', name: email });
        return t.http.post(`/api/farms/${farmId}/members`).set(bearer(token[who])).send({ email, role: 'viewer' });
      },
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
      call: (who) =>
        t.http
          .put(`/api/houses/${houseId}/calendar`)
          .set(bearer(token[who]))
          .send({
            periods: [{ startMonthDay: '10-01', endMonthDay: '04-30', mode: 'heated', label: `set by ${who}` }],
          }),
    },
    {
      route: 'GET /farms/:id/fuel-prices',
      expected: { owner: 200, grower: 200, adviser: 200, viewer: 200, outsider: 404, admin: 404 },
      call: (who) => t.http.get(`/api/farms/${farmId}/fuel-prices`).set(bearer(token[who])),
    },
    {
      route: 'PUT /farms/:id/fuel-prices',
      expected: { owner: 200, grower: 200, adviser: 403, viewer: 403, outsider: 404, admin: 404 },
      call: (who) =>
        t.http.put(`/api/farms/${farmId}/fuel-prices`).set(bearer(token[who])).send({ prices: demoPrices }),
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
      .expect(400);
    expect(res.body.message).toMatch(/at least one owner/);
  });
});
