import { houseBody } from './fixtures';
import { bearer, createTestApp, ifMatch, joinByInvitation, signIn, type TestApp } from './test-app';

/** Measure costs typed once are kept with the house: GET/PUT /api/houses/:id/measure-plan. */
describe('measure plan kept with a house (e2e)', () => {
  let t: TestApp;
  let owner: string;
  let grower: string;
  let viewer: string;
  let outsider: string;
  let farmId: number;
  let houseId: number;

  const plan = (id = houseId) => `/api/houses/${id}/measure-plan`;
  const measures = [
    { kind: 'second-poly-layer', surfaces: ['roof'], costAmount: 2400 },
    { kind: 'sealing', costAmount: null },
    { kind: 'night-setpoint-lower', lowerByK: 2 },
  ];

  beforeAll(async () => {
    t = await createTestApp();
    owner = await signIn(t, 'owner@example.com');
    grower = await signIn(t, 'grower@example.com');
    for (const who of ['viewer', 'outsider']) {
      const res = await t.http
        .post('/api/auth/register')
        .send({ email: `${who}@example.org`, password: 'member-pass-8472', name: who })
        .expect(201);
      if (who === 'viewer') viewer = res.body.accessToken;
      else outsider = res.body.accessToken;
    }
    farmId = (await t.http.get('/api/farms').set(bearer(owner)).expect(200)).body[0].id;
    await joinByInvitation(t, owner, farmId, 'viewer@example.org', 'viewer', viewer);
    houseId = (
      await t.http
        .post(`/api/farms/${farmId}/houses`)
        .set(bearer(owner))
        .send(houseBody('Measure plan house'))
        .expect(201)
    ).body.id;
  });
  afterAll(() => t.close());

  it('starts empty at version 0, keeps the measures and costs on the first save, and gives them back', async () => {
    expect((await t.http.get(plan()).set(bearer(grower)).expect(200)).body).toEqual({
      houseId,
      measures: [],
      version: 0,
    });
    const saved = (await t.http.put(plan()).set(bearer(grower)).set(ifMatch(0)).send({ measures }).expect(200)).body;
    expect(saved.version).toBe(1);
    const read = (await t.http.get(plan()).set(bearer(viewer)).expect(200)).body;
    expect(read.measures).toEqual(measures);
    expect(read.measures[0].costAmount).toBe(2400);
    expect(read.measures[1].costAmount).toBeNull();
    expect(read.measures[2]).not.toHaveProperty('costAmount');
  });

  it('needs the version loaded: 428 without it, 409 with an old one (with what is stored), 200 on the current', async () => {
    const changed = [{ kind: 'sealing', costAmount: 900 }];
    await t.http.put(plan()).set(bearer(grower)).send({ measures: changed }).expect(428);
    const stale = await t.http.put(plan()).set(bearer(grower)).set(ifMatch(0)).send({ measures: changed }).expect(409);
    expect(stale.body.current.measures).toEqual(measures);
    const saved = await t.http.put(plan()).set(bearer(grower)).set(ifMatch(1)).send({ measures: changed }).expect(200);
    expect(saved.body).toEqual({ houseId, measures: changed, version: 2 });
  });

  it('refuses a measure that is not one, in the one error shape naming the field', async () => {
    const res = await t.http
      .put(plan())
      .set(bearer(grower))
      .set(ifMatch(2))
      .send({ measures: [{ kind: 'paint-it-white', costAmount: 5 }] })
      .expect(400);
    expect(res.body.details.some((detail: { field: string }) => detail.field.startsWith('measures.0'))).toBe(true);
    await t.http
      .put(plan())
      .set(bearer(grower))
      .set(ifMatch(2))
      .send({ measures: [{ kind: 'sealing', costAmount: -1 }] })
      .expect(400);
  });

  it('lets a viewer read but not save, and hides the house from someone outside the farm', async () => {
    await t.http.put(plan()).set(bearer(viewer)).set(ifMatch(2)).send({ measures: [] }).expect(403);
    await t.http.get(plan()).set(bearer(outsider)).expect(404);
    await t.http.put(plan()).set(bearer(outsider)).set(ifMatch(2)).send({ measures: [] }).expect(404);
  });

  it('goes with the house when the house is deleted', async () => {
    const other = (
      await t.http
        .post(`/api/farms/${farmId}/houses`)
        .set(bearer(owner))
        .send(houseBody('Measure plan house'))
        .expect(201)
    ).body.id as number;
    await t.http.put(plan(other)).set(bearer(owner)).set(ifMatch(0)).send({ measures }).expect(200);
    await t.http.delete(`/api/houses/${other}`).set(bearer(owner)).expect(204);
    await t.http.get(plan(other)).set(bearer(owner)).expect(404);
    const { HouseMeasurePlan } = await import('../src/season/models/house-measure-plan.model');
    expect(await HouseMeasurePlan.count({ where: { houseId: other } })).toBe(0);
  });
});
