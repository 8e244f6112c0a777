import { bearer, createTestApp, ifMatch, signIn, type TestApp } from './test-app';

describe('houses (e2e)', () => {
  let t: TestApp;
  let token: string;
  let farmId: number;

  beforeAll(async () => {
    t = await createTestApp();
    token = await signIn(t, 'grower@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(token)).expect(200)).body[0].id;
  });
  afterAll(() => t.close());

  it('seeds an invented demo farm with three houses of different shapes and coverings', async () => {
    const farm = (await t.http.get(`/api/farms/${farmId}`).set(bearer(token)).expect(200)).body;
    expect(farm.name).toMatch(/invented/i);
    expect(farm.houseCount).toBeGreaterThanOrEqual(3);
    const houses = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(token)).expect(200)).body;
    expect(new Set(houses.map((h: { shape: string }) => h.shape)).size).toBe(3);
    expect(new Set(houses.map((h: { coverings: { roof: string } }) => h.coverings.roof)).size).toBeGreaterThanOrEqual(
      3,
    );
  });

  it('keeps an edit: PATCH then GET returns the new width', async () => {
    const house = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(token)).expect(200)).body[0];
    await t.http
      .patch(`/api/houses/${house.id}`)
      .set(bearer(token))
      .set(ifMatch(house.version))
      .send({ widthM: 10.5 })
      .expect(200);
    const again = (await t.http.get(`/api/houses/${house.id}`).set(bearer(token)).expect(200)).body;
    expect(again.widthM).toBe(10.5);
    expect(again.coverings).toEqual(house.coverings);
  });

  it('refuses out-of-bounds numbers naming the field (400)', async () => {
    const house = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(token)).expect(200)).body[0];
    const res = await t.http
      .patch(`/api/houses/${house.id}`)
      .set(bearer(token))
      .send({ widthM: 500, setpoints: { dayHeatingC: 18, nightHeatingC: 99, coolingC: 25 } })
      .expect(400);
    const fields = res.body.details.map((d: { field: string }) => d.field);
    expect(fields).toEqual(expect.arrayContaining(['widthM', 'setpoints.nightHeatingC']));
  });

  it('refuses a house without its nested groups with 400 naming each', async () => {
    const res = await t.http
      .post(`/api/farms/${farmId}/houses`)
      .set(bearer(token))
      .send({
        name: 'Incomplete',
        shape: 'gable',
        spans: 1,
        widthM: 9,
        lengthM: 30,
        eaveHeightM: 2.5,
        ridgeHeightM: 4.5,
        airLeakageClassId: 'new-film-double',
        perimeterInsulated: false,
        heaters: [],
        inletAreaM2: 0,
      })
      .expect(400);
    const fields = res.body.details.map((d: { field: string }) => d.field);
    expect(fields).toEqual(expect.arrayContaining(['coverings', 'exhaustFans', 'setpoints']));
  });

  it('refuses a ridge below the eave and an unknown covering with 422 naming the field', async () => {
    const house = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(token)).expect(200)).body[0];
    const ridge = await t.http
      .patch(`/api/houses/${house.id}`)
      .set(bearer(token))
      .set(ifMatch(house.version))
      .send({ eaveHeightM: 3, ridgeHeightM: 2.5 })
      .expect(422);
    expect(ridge.body.field).toBe('ridgeHeightM');
    const covering = await t.http
      .patch(`/api/houses/${house.id}`)
      .set(bearer(token))
      .set(ifMatch(house.version))
      .send({ coverings: { roof: 'cling-film', sidewalls: 'poly-single', endwalls: 'poly-single' } })
      .expect(422);
    expect(covering.body.field).toBe('coverings.roof');
    const kept = (await t.http.get(`/api/houses/${house.id}`).set(bearer(token)).expect(200)).body;
    expect(kept.ridgeHeightM).toBe(house.ridgeHeightM);
  });

  it('answers 404 for a house that does not exist and 400 for a non-numeric id', async () => {
    await t.http.get('/api/houses/999999').set(bearer(token)).expect(404);
    await t.http.get('/api/houses/abc').set(bearer(token)).expect(400);
  });

  it('serves the reference tables with provenance on every row', async () => {
    const ref = (await t.http.get('/api/reference-data').set(bearer(token)).expect(200)).body;
    expect(ref.coverings.rows.length).toBeGreaterThan(5);
    for (const table of Object.values(ref) as Array<{ rows: Array<{ source: string; confidence: string }> }>) {
      for (const row of table.rows) {
        expect(row.source.length).toBeGreaterThan(7);
        expect(row.confidence).toEqual(expect.any(String));
      }
    }
  });

  it('publishes the OpenAPI document', async () => {
    const doc = (await t.http.get('/api/docs-json').expect(200)).body;
    expect(doc.paths['/api/houses/{houseId}']).toBeDefined();
    expect(doc.components.schemas.HouseDto).toBeDefined();
  });
});

describe('farm climate (e2e)', () => {
  let t: TestApp;
  let grower: string;
  let farmId: number;

  beforeAll(async () => {
    t = await createTestApp();
    grower = await signIn(t, 'grower@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body[0].id;
  });
  afterAll(() => t.close());

  it('has the demo climate with 12 months', async () => {
    const res = (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(grower)).expect(200)).body;
    expect(res.climate.monthly).toHaveLength(12);
    expect(res.climate.winterDesignC).toBeLessThan(-20);
  });

  it('saves a new climate and refuses one whose minimum is above its maximum, naming the month', async () => {
    const loaded = (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(grower)).expect(200)).body;
    const current = loaded.climate;
    const warmer = { ...current, winterDesignC: -25 };
    await t.http
      .put(`/api/farms/${farmId}/climate`)
      .set(bearer(grower))
      .set(ifMatch(loaded.version))
      .send(warmer)
      .expect(200);
    expect(
      (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(grower)).expect(200)).body.climate.winterDesignC,
    ).toBe(-25);
    const broken = {
      ...current,
      monthly: current.monthly.map((m: { month: number }) =>
        m.month === 3 ? { ...m, meanDailyMinC: 10, meanDailyMaxC: 2 } : m,
      ),
    };
    const res = await t.http.put(`/api/farms/${farmId}/climate`).set(bearer(grower)).send(broken).expect(422);
    expect(res.body.field).toBe('climate.monthly[2].meanDailyMinC');
    const elevenMonths = { ...current, monthly: current.monthly.slice(1) };
    await t.http.put(`/api/farms/${farmId}/climate`).set(bearer(grower)).send(elevenMonths).expect(400);
  });

  it('lets the adviser read but not write the climate', async () => {
    const adviser = await signIn(t, 'adviser@example.com');
    const current = (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(adviser)).expect(200)).body.climate;
    await t.http.put(`/api/farms/${farmId}/climate`).set(bearer(adviser)).send(current).expect(403);
  });
});
