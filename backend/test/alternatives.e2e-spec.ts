import { houseBody } from './fixtures';
import { bearer, createTestApp, signIn, type TestApp, ifMatch, versionOf } from './test-app';

interface House {
  id: number;
  name: string;
  coverings: { roof: string; sidewalls: string; endwalls: string };
  ridgeHeightM: number;
  heaters: Array<{ count: number; ratedInputW: number; efficiency: number; fuelId: string }>;
}
interface Alternative {
  id: number;
  name: string;
  patch: Record<string, unknown>;
  changedFields: string[];
  costAmount: number | null;
  createdByName: string | null;
  invalid: { field: string; message: string } | null;
  house: House | null;
  calendar: unknown[] | null;
}

const SEASON = { startDate: '2026-09-01', endDate: '2027-05-31' };
const DOUBLE_POLY = { coverings: { roof: 'poly-double-inflated', sidewalls: 'poly-double-inflated' } };

/** What a per-house estimate adds to the bare estimate (the house id and where its inputs came from). */
function bare(estimate: Record<string, unknown>): Record<string, unknown> {
  const { houseId: _h, conditionsUsed: _c, conditionsSource: _s, siteUsed: _u, inputsUsed: _i, ...rest } = estimate;
  return rest;
}

describe('alternatives of a house and the side-by-side (e2e)', () => {
  let t: TestApp;
  let grower: string;
  let adviser: string;
  let farmId: number;
  let houseB: House;

  beforeAll(async () => {
    t = await createTestApp();
    grower = await signIn(t, 'grower@example.com');
    adviser = await signIn(t, 'adviser@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body[0].id;
    const list: House[] = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(grower)).expect(200)).body;
    houseB = list.find((house) => house.name.startsWith('House B'))!;
  });
  afterAll(() => t.close());

  const newHouse = async (name: string) =>
    (await t.http.post(`/api/farms/${farmId}/houses`).set(bearer(grower)).send(houseBody(name)).expect(201))
      .body as House;
  const addAlternative = (houseId: number, body: object, token = grower) =>
    t.http.post(`/api/houses/${houseId}/alternatives`).set(bearer(token)).send(body);

  it('saves a grower’s re-covering as a patch with a cost, and an adviser’s bigger-heater proposal', async () => {
    const recover: Alternative = (
      await addAlternative(houseB.id, { name: 'Double poly', patch: DOUBLE_POLY, costAmount: 4200 }).expect(201)
    ).body;
    expect(recover.changedFields).toEqual(['coverings.roof', 'coverings.sidewalls']);
    expect(recover.house?.coverings).toEqual({ ...houseB.coverings, ...DOUBLE_POLY.coverings });
    expect(recover.costAmount).toBe(4200);
    expect(recover.invalid).toBeNull();

    // the adviser cannot edit the house …
    await t.http
      .patch(`/api/houses/${houseB.id}`)
      .set(bearer(adviser))
      .set(ifMatch(await versionOf(t, adviser, `/api/houses/${houseB.id}`)))
      .send({ notes: 'x' })
      .expect(403);
    // … but may propose an alternative of it
    const bigger = [{ ...houseB.heaters[0], count: houseB.heaters[0].count + 2 }];
    const proposal: Alternative = (
      await addAlternative(houseB.id, { name: 'Two more heaters', patch: { heaters: bigger } }, adviser).expect(201)
    ).body;
    expect(proposal.createdByName).toMatch(/Ada/);
    expect(proposal.house?.heaters).toEqual(bigger);
    const list: Alternative[] = (
      await t.http.get(`/api/houses/${houseB.id}/alternatives`).set(bearer(adviser)).expect(200)
    ).body;
    expect(list.map((a) => a.name)).toEqual(['Double poly', 'Two more heaters']);
  });

  it('takes the patch from an edited house body: only what differs is stored', async () => {
    const stored: House = (await t.http.get(`/api/houses/${houseB.id}`).set(bearer(grower)).expect(200)).body;
    const edited = { ...stored, coverings: { ...stored.coverings, endwalls: 'polycarbonate-twin-8mm' } };
    const alt: Alternative = (await addAlternative(houseB.id, { name: 'Twin-wall ends', house: edited }).expect(201))
      .body;
    expect(alt.patch).toEqual({ coverings: { endwalls: 'polycarbonate-twin-8mm' } });
    await t.http.delete(`/api/alternatives/${alt.id}`).set(bearer(grower)).expect(204);
  });

  it('refuses a patch that names no house field or makes an invalid house, naming the field', async () => {
    const unknown = await addAlternative(houseB.id, { name: 'x', patch: { roofColour: 'red' } }).expect(422);
    expect(unknown.body.field).toBe('patch.roofColour');
    const bad = await addAlternative(houseB.id, { name: 'x', patch: { coverings: { roof: 'no-such' } } }).expect(422);
    expect(bad.body.field).toBe('patch.coverings.roof');
    const outOfBounds = await addAlternative(houseB.id, { name: 'x', patch: { widthM: -3 } }).expect(422);
    expect(outOfBounds.body.field).toBe('patch.widthM');
    await addAlternative(houseB.id, { name: 'x', patch: { name: 'renamed' } }).expect(422);
  });

  it('lets a later house edit flow into an alternative that does not change that field', async () => {
    const house = await newHouse('Flow house');
    const alt: Alternative = (
      await addAlternative(house.id, { name: 'Double roof', patch: { coverings: { roof: 'poly-single' } } }).expect(201)
    ).body;
    await t.http
      .patch(`/api/houses/${house.id}`)
      .set(bearer(grower))
      .set(ifMatch(await versionOf(t, grower, `/api/houses/${house.id}`)))
      .send({ coverings: { roof: 'glass-single', sidewalls: 'glass-single', endwalls: 'glass-single' }, spans: 2 })
      .expect(200);
    const after: Alternative = (await t.http.get(`/api/alternatives/${alt.id}`).set(bearer(grower)).expect(200)).body;
    expect(after.house?.coverings).toEqual({
      roof: 'poly-single',
      sidewalls: 'glass-single',
      endwalls: 'glass-single',
    });
    expect(after.house).toMatchObject({ spans: 2 });
  });

  it('shows an alternative the house edit made invalid as invalid, with the field, never a 500 or a gap', async () => {
    const house = await newHouse('Shrinking house'); // eave 2.5, ridge 4.5
    const tall: Alternative = (
      await addAlternative(house.id, { name: 'Taller walls', patch: { eaveHeightM: 4 } }).expect(201)
    ).body;
    const good: Alternative = (
      await addAlternative(house.id, { name: 'Double poly', patch: DOUBLE_POLY, costAmount: 3000 }).expect(201)
    ).body;
    await t.http
      .patch(`/api/houses/${house.id}`)
      .set(bearer(grower))
      .set(ifMatch(await versionOf(t, grower, `/api/houses/${house.id}`)))
      .send({ ridgeHeightM: 3.5 })
      .expect(200);

    const list: Alternative[] = (
      await t.http.get(`/api/houses/${house.id}/alternatives`).set(bearer(grower)).expect(200)
    ).body;
    expect(list).toHaveLength(2);
    const invalid = list.find((a) => a.id === tall.id)!;
    expect(invalid.house).toBeNull();
    expect(invalid.invalid?.field).toMatch(/ridgeHeightM|eaveHeightM/);

    const side = await t.http
      .post(`/api/houses/${house.id}/side-by-side`)
      .set(bearer(grower))
      .send({ ...SEASON, alternativeIds: [tall.id, good.id] })
      .expect(200);
    expect(side.body.columns.map((c: { key: string }) => c.key)).toEqual([
      'house',
      `alternative-${tall.id}`,
      `alternative-${good.id}`,
    ]);
    expect(side.body.columns[1].invalid.field).toMatch(/ridgeHeightM|eaveHeightM/);
    expect(side.body.columns[1].season).toBeNull();
    expect(side.body.columns[2].season.total.cost).toBeGreaterThan(0);

    const season = await t.http
      .post(`/api/houses/${house.id}/season`)
      .set(bearer(grower))
      .send({ ...SEASON, alternativeId: tall.id })
      .expect(422);
    expect(season.body.field).toMatch(/^alternative\.(ridgeHeightM|eaveHeightM)/);
    await t.http.post(`/api/alternatives/${tall.id}/adopt`).set(bearer(grower)).expect(422);
  });

  it('reproduces the single estimates of the house and of "house + inflated double poly" exactly', async () => {
    const alt: Alternative = (
      await addAlternative(houseB.id, { name: 'Exact check', patch: DOUBLE_POLY, costAmount: 4200 }).expect(201)
    ).body;
    // the same house with the alternative typed in for real: a duplicate, edited
    const copy: House = (
      await t.http.post(`/api/houses/${houseB.id}/duplicate`).set(bearer(grower)).send({}).expect(201)
    ).body;
    await t.http
      .patch(`/api/houses/${copy.id}`)
      .set(bearer(grower))
      .set(ifMatch(await versionOf(t, grower, `/api/houses/${copy.id}`)))
      .send({ coverings: { ...houseB.coverings, ...DOUBLE_POLY.coverings } })
      .expect(200);

    const side = (
      await t.http
        .post(`/api/houses/${houseB.id}/side-by-side`)
        .set(bearer(grower))
        .send({ ...SEASON, alternativeIds: [alt.id] })
        .expect(200)
    ).body;
    const [houseColumn, altColumn] = side.columns;

    for (const [column, id] of [
      [houseColumn, houseB.id],
      [altColumn, copy.id],
    ] as const) {
      const heating = (await t.http.post(`/api/houses/${id}/estimate`).set(bearer(grower)).send({}).expect(200)).body;
      const cooling = (await t.http.post(`/api/houses/${id}/cooling`).set(bearer(grower)).send({}).expect(200)).body;
      const season = (await t.http.post(`/api/houses/${id}/season`).set(bearer(grower)).send(SEASON).expect(200)).body;
      expect(column.heating).toEqual(bare(heating));
      expect(column.cooling).toEqual(bare(cooling));
      expect(column.season).toEqual(bare(season));
    }
    // the duplicate carried the calendar: both are heated for spring bedding plants only
    expect(altColumn.season.period.heatedDays).toBe(houseColumn.season.period.heatedDays);
    expect(altColumn.season.period.heatedDays).toBeLessThan(altColumn.season.period.days);

    const saving = houseColumn.season.total.cost - altColumn.season.total.cost;
    expect(saving).toBeGreaterThan(0);
    expect(altColumn.versusHouse.yearlySaving).toBeCloseTo(saving, 9);
    expect(altColumn.versusHouse.paybackYears).toBeCloseTo(4200 / saving, 9);
    expect(altColumn.light[0].changeFromHouse).toBeLessThan(0);
    expect(altColumn.heating.heater.verdict).toEqual(expect.any(String));

    // the season route runs for the alternative too, with the same figures
    const forAlt = (
      await t.http
        .post(`/api/houses/${houseB.id}/season`)
        .set(bearer(grower))
        .send({ ...SEASON, alternativeId: alt.id })
        .expect(200)
    ).body;
    expect(bare(forAlt)).toEqual(altColumn.season);
  });

  it('compares at most four alternatives, and only the house’s own', async () => {
    const other = await newHouse('Other house');
    const foreign: Alternative = (await addAlternative(other.id, { name: 'x', patch: DOUBLE_POLY }).expect(201)).body;
    const wrong = await t.http
      .post(`/api/houses/${houseB.id}/side-by-side`)
      .set(bearer(grower))
      .send({ alternativeIds: [foreign.id] })
      .expect(422);
    expect(wrong.body.field).toBe('alternativeIds');
    await t.http
      .post(`/api/houses/${houseB.id}/side-by-side`)
      .set(bearer(grower))
      .send({ alternativeIds: [1, 2, 3, 4, 5] })
      .expect(400);
  });

  it('makes an alternative the house in one step, keeping the old state as an alternative', async () => {
    const house = await newHouse('Adopting house');
    await t.http
      .put(`/api/houses/${house.id}/calendar`)
      .set(bearer(grower))
      .set(ifMatch(await versionOf(t, grower, `/api/houses/${house.id}/calendar`)))
      .send({ periods: [{ startMonthDay: '01-15', endMonthDay: '05-31', mode: 'heated' }] })
      .expect(200);
    const alt: Alternative = (
      await addAlternative(house.id, {
        name: 'Single poly, longer season',
        patch: { coverings: { roof: 'poly-single' }, perimeterInsulated: true },
        calendar: [{ startMonthDay: '11-01', endMonthDay: '05-31', mode: 'heated', label: 'Longer' }],
      }).expect(201)
    ).body;
    await t.http.post(`/api/alternatives/${alt.id}/adopt`).set(bearer(adviser)).expect(403);
    const adopted = (await t.http.post(`/api/alternatives/${alt.id}/adopt`).set(bearer(grower)).expect(200)).body;
    expect(adopted.house.coverings.roof).toBe('poly-single');
    expect(adopted.house.perimeterInsulated).toBe(true);
    expect(adopted.previous.patch).toEqual({ coverings: { roof: 'poly-double-inflated' }, perimeterInsulated: false });
    expect(adopted.previous.calendar).toEqual([{ startMonthDay: '01-15', endMonthDay: '05-31', mode: 'heated' }]);
    const calendar = (await t.http.get(`/api/houses/${house.id}/calendar`).set(bearer(grower)).expect(200)).body;
    expect(calendar.periods[0].startMonthDay).toBe('11-01');
    const list: Alternative[] = (
      await t.http.get(`/api/houses/${house.id}/alternatives`).set(bearer(grower)).expect(200)
    ).body;
    expect(list.map((a) => a.id)).toEqual([adopted.previous.id]);
    // adopting the kept state brings the house back as it was
    const back = (await t.http.post(`/api/alternatives/${adopted.previous.id}/adopt`).set(bearer(grower)).expect(200))
      .body;
    const { updatedAt: _u1, ...restored } = back.house;
    const { updatedAt: _u2, ...original } = house as unknown as Record<string, unknown>;
    expect(restored).toEqual(original);
  });

  it('duplicates a house with its calendar and alternatives', async () => {
    const copy: House = (
      await t.http
        .post(`/api/houses/${houseB.id}/duplicate`)
        .set(bearer(grower))
        .send({ name: 'House B copy' })
        .expect(201)
    ).body;
    expect(copy.name).toBe('House B copy');
    expect(copy.coverings).toEqual(houseB.coverings);
    const [calendarB, calendarCopy] = await Promise.all(
      [houseB.id, copy.id].map(async (id) => (await t.http.get(`/api/houses/${id}/calendar`).set(bearer(grower))).body),
    );
    expect(calendarCopy.periods).toEqual(calendarB.periods);
    expect(calendarCopy.periods.length).toBeGreaterThan(0);
    const alternatives = (await t.http.get(`/api/houses/${copy.id}/alternatives`).set(bearer(grower))).body;
    expect(alternatives.map((a: Alternative) => a.name)).toContain('Double poly');
    await t.http.post(`/api/houses/${houseB.id}/duplicate`).set(bearer(adviser)).send({}).expect(403);
  });

  it('deletes a house’s alternatives with the house', async () => {
    const house = await newHouse('Doomed house');
    const alt: Alternative = (await addAlternative(house.id, { name: 'x', patch: DOUBLE_POLY }).expect(201)).body;
    await t.http.delete(`/api/houses/${house.id}`).set(bearer(grower)).expect(204);
    await t.http.get(`/api/alternatives/${alt.id}`).set(bearer(grower)).expect(404);
    const { HouseAlternative } = await import('../src/alternatives/models/house-alternative.model');
    expect(await HouseAlternative.count({ where: { houseId: house.id } })).toBe(0);
  });
});
