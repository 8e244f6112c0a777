import { houseBody } from './fixtures';
import { bearer, createTestApp, ifMatch, signIn, type TestApp } from './test-app';

interface Lamps {
  lampTypeId?: string | null;
  powerDensityWPerM2: number;
  hoursPerDayByMonth: number[];
  heatToHouseFraction: number;
}
interface House {
  id: number;
  version: number;
  lamps: Lamps | null;
}

const LAMPS: Lamps = {
  lampTypeId: 'led-horticultural',
  powerDensityWPerM2: 45,
  hoursPerDayByMonth: [12, 12, 10, 8, 4, 0, 0, 0, 4, 8, 10, 12],
  heatToHouseFraction: 0.95,
};
const SEASON = { startDate: '2026-11-01', endDate: '2027-02-28' };

describe('supplemental lamps of a house (e2e)', () => {
  let t: TestApp;
  let grower: string;
  let farmId: number;

  beforeAll(async () => {
    t = await createTestApp();
    grower = await signIn(t, 'grower@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body[0].id;
  });
  afterAll(() => t.close());

  const create = (body: object) => t.http.post(`/api/farms/${farmId}/houses`).set(bearer(grower)).send(body);
  const patch = (house: House, body: object) =>
    t.http.patch(`/api/houses/${house.id}`).set(bearer(grower)).set(ifMatch(house.version)).send(body);

  it('a house without lamps reads lamps: null; lamps sent are stored and read back as sent', async () => {
    const plain: House = (await create(houseBody('No lamps')).expect(201)).body;
    expect(plain.lamps).toBeNull();
    const lit: House = (await create({ ...houseBody('Lit'), lamps: LAMPS }).expect(201)).body;
    expect(lit.lamps).toEqual(LAMPS);
    const again: House = (await t.http.get(`/api/houses/${lit.id}`).set(bearer(grower)).expect(200)).body;
    expect(again.lamps).toEqual(LAMPS);
    // lamps: null takes them away
    const dark: House = (await patch(again, { lamps: null }).expect(200)).body;
    expect(dark.lamps).toBeNull();
  });

  it('refuses out-of-range lamps with 400 naming each field, and a wrong number of months', async () => {
    const house: House = (await create(houseBody('Lamp bounds')).expect(201)).body;
    const tooMuch = await patch(house, {
      lamps: { ...LAMPS, powerDensityWPerM2: 500, heatToHouseFraction: 1.5 },
    }).expect(400);
    expect(tooMuch.body.details.map((d: { field: string }) => d.field)).toEqual(
      expect.arrayContaining(['lamps.powerDensityWPerM2', 'lamps.heatToHouseFraction']),
    );
    const elevenMonths = await patch(house, { lamps: { ...LAMPS, hoursPerDayByMonth: Array(11).fill(8) } }).expect(400);
    expect(elevenMonths.body.details.map((d: { field: string }) => d.field)).toContain('lamps.hoursPerDayByMonth');
    const thirteenMonths = await create({
      ...houseBody('Thirteen'),
      lamps: { ...LAMPS, hoursPerDayByMonth: Array(13).fill(8) },
    }).expect(400);
    expect(thirteenMonths.body.details.map((d: { field: string }) => d.field)).toContain('lamps.hoursPerDayByMonth');
    const twentyFiveHours = await patch(house, {
      lamps: { ...LAMPS, hoursPerDayByMonth: [25, ...Array(11).fill(8)] },
    }).expect(400);
    expect(twentyFiveHours.body.details.map((d: { field: string }) => d.field)).toContain('lamps.hoursPerDayByMonth');
    const noHours = await patch(house, { lamps: { powerDensityWPerM2: 40, heatToHouseFraction: 0.95 } }).expect(400);
    expect(noHours.body.details.map((d: { field: string }) => d.field)).toContain('lamps.hoursPerDayByMonth');
    // an unknown lamp type is refused naming it (422, like an unknown covering)
    const unknown = await patch(house, { lamps: { ...LAMPS, lampTypeId: 'plasma' } }).expect(422);
    expect(unknown.body.field).toBe('lamps.lampTypeId');
    // nothing was stored by the refused writes
    const stored: House = (await t.http.get(`/api/houses/${house.id}`).set(bearer(grower)).expect(200)).body;
    expect(stored.lamps).toBeNull();
    expect(stored.version).toBe(house.version);
  });

  it('the season shows lamp electricity and the fuel their heat saves; the design night does not credit them', async () => {
    const plain: House = (await create(houseBody('Season dark')).expect(201)).body;
    const lit: House = (await create({ ...houseBody('Season lit'), lamps: LAMPS }).expect(201)).body;
    const season = async (house: House) =>
      (await t.http.post(`/api/houses/${house.id}/season`).set(bearer(grower)).send(SEASON).expect(200)).body;
    const dark = await season(plain);
    const bright = await season(lit);
    expect(dark.lamps).toBeNull();
    expect(bright.lamps.electricityKWh).toBeGreaterThan(0);
    expect(bright.lamps.heatSavedKWh).toBeGreaterThan(0);
    expect(bright.total.fuelInputKWh).toBeLessThan(dark.total.fuelInputKWh);
    const monthlyElectricity = bright.monthly.reduce(
      (sum: number, month: { lampElectricityKWh: number }) => sum + month.lampElectricityKWh,
      0,
    );
    expect(monthlyElectricity).toBeCloseTo(bright.lamps.electricityKWh, 6);

    const estimate = async (house: House) =>
      (await t.http.post(`/api/houses/${house.id}/estimate`).set(bearer(grower)).send({}).expect(200)).body;
    const darkNight = await estimate(plain);
    const litNight = await estimate(lit);
    expect(litNight.heatLoss.totalW).toBe(darkNight.heatLoss.totalW);
    expect(litNight.heater.requiredOutputW).toBe(darkNight.heater.requiredOutputW);
    expect(litNight.lamps.creditedW).toBe(0);
    expect(litNight.cautions.join(' ')).toMatch(/licensed electrician/);
  });

  it('an alternative adds lamps to a house without them, and says so in its changed fields', async () => {
    const house: House = (await create(houseBody('Alternative base')).expect(201)).body;
    const alternative = (
      await t.http
        .post(`/api/houses/${house.id}/alternatives`)
        .set(bearer(grower))
        .send({ name: 'Add LED lamps', patch: { lamps: LAMPS } })
        .expect(201)
    ).body;
    expect(alternative.house.lamps).toEqual(LAMPS);
    expect(alternative.changedFields).toEqual(
      expect.arrayContaining(['lamps.powerDensityWPerM2', 'lamps.hoursPerDayByMonth']),
    );
    const refused = await t.http
      .post(`/api/houses/${house.id}/alternatives`)
      .set(bearer(grower))
      .send({ name: 'Bad lamps', patch: { lamps: { ...LAMPS, hoursPerDayByMonth: [1, 2] } } });
    expect([400, 422]).toContain(refused.status);
    expect(JSON.stringify(refused.body)).toMatch(/lamps\.hoursPerDayByMonth/);
  });
});
