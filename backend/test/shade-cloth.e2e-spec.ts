import { houseBody } from './fixtures';
import { bearer, createTestApp, ifMatch, signIn, type TestApp } from './test-app';

interface ShadeCloth {
  solarTransmittance: number;
  months: number[];
}
interface House {
  id: number;
  name: string;
  version: number;
  shadeCloth: ShadeCloth | null;
}

const SUMMER_CLOTH: ShadeCloth = { solarTransmittance: 0.5, months: [5, 6, 7, 8, 9] };

describe('a house’s shade cloth (e2e)', () => {
  let t: TestApp;
  let grower: string;
  let farmId: number;

  beforeAll(async () => {
    t = await createTestApp();
    grower = await signIn(t, 'grower@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body[0].id;
  });
  afterAll(() => t.close());

  const newHouse = async (name: string, extra: object = {}) =>
    (
      await t.http
        .post(`/api/farms/${farmId}/houses`)
        .set(bearer(grower))
        .send({ ...houseBody(name), ...extra })
        .expect(201)
    ).body as House;
  const getHouse = async (id: number) =>
    (await t.http.get(`/api/houses/${id}`).set(bearer(grower)).expect(200)).body as House;
  const patchHouse = (house: House, body: object) =>
    t.http.patch(`/api/houses/${house.id}`).set(bearer(grower)).set(ifMatch(house.version)).send(body);

  it('demo houses and houses saved without one carry no cloth (null)', async () => {
    const houses: House[] = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(grower)).expect(200)).body;
    expect(houses.length).toBeGreaterThanOrEqual(3);
    for (const house of houses) expect(house.shadeCloth).toBeNull();
    const plain = await newHouse('No cloth');
    expect(plain.shadeCloth).toBeNull();
  });

  it('stores a cloth given on create and on edit, months in calendar order, and removes it with null', async () => {
    const created = await newHouse('Shaded', { shadeCloth: { solarTransmittance: 0.3, months: [8, 6, 7] } });
    expect(created.shadeCloth).toEqual({ solarTransmittance: 0.3, months: [6, 7, 8] });
    expect((await getHouse(created.id)).shadeCloth).toEqual({ solarTransmittance: 0.3, months: [6, 7, 8] });

    const edited: House = (await patchHouse(created, { shadeCloth: SUMMER_CLOTH }).expect(200)).body;
    expect(edited.shadeCloth).toEqual(SUMMER_CLOTH);
    expect(edited.version).toBe(created.version + 1);

    // other edits leave the cloth as it is
    const widened: House = (await patchHouse(edited, { widthM: 9.5 }).expect(200)).body;
    expect(widened.shadeCloth).toEqual(SUMMER_CLOTH);

    const removed: House = (await patchHouse(widened, { shadeCloth: null }).expect(200)).body;
    expect(removed.shadeCloth).toBeNull();
    expect((await getHouse(created.id)).shadeCloth).toBeNull();
  });

  it.each<[string, unknown, string]>([
    ['a share above 1', { solarTransmittance: 1.5, months: [7] }, 'shadeCloth.solarTransmittance'],
    ['a negative share', { solarTransmittance: -0.1, months: [7] }, 'shadeCloth.solarTransmittance'],
    ['a share that is not a number', { solarTransmittance: '50 %', months: [7] }, 'shadeCloth.solarTransmittance'],
    ['month 0', { solarTransmittance: 0.5, months: [0, 7] }, 'shadeCloth.months'],
    ['month 13', { solarTransmittance: 0.5, months: [7, 13] }, 'shadeCloth.months'],
    ['a month that is not whole', { solarTransmittance: 0.5, months: [6.5] }, 'shadeCloth.months'],
    ['a month named twice', { solarTransmittance: 0.5, months: [7, 7] }, 'shadeCloth.months'],
    ['months that are not a list', { solarTransmittance: 0.5, months: 7 }, 'shadeCloth.months'],
    ['no months at all', { solarTransmittance: 0.5 }, 'shadeCloth.months'],
    ['a field the cloth does not have', { ...SUMMER_CLOTH, colour: 'black' }, 'shadeCloth.colour'],
    ['a cloth that is not an object', 0.5, 'shadeCloth'],
  ])('refuses %s with 400 naming the field, and keeps the house as it was', async (_what, cloth, field) => {
    const house = await newHouse(`Refused ${field}`, { shadeCloth: SUMMER_CLOTH });
    const res = await patchHouse(house, { shadeCloth: cloth }).expect(400);
    expect(res.body.details.map((d: { field: string }) => d.field)).toContain(field);
    const created = await t.http
      .post(`/api/farms/${farmId}/houses`)
      .set(bearer(grower))
      .send({ ...houseBody('Refused on create'), shadeCloth: cloth })
      .expect(400);
    expect(created.body.details.map((d: { field: string }) => d.field)).toContain(field);
    const kept = await getHouse(house.id);
    expect(kept.shadeCloth).toEqual(SUMMER_CLOTH);
    expect(kept.version).toBe(house.version);
  });

  it('the stored cloth reaches the cooling estimate: in July a 50 % cloth halves the light and the solar gain', async () => {
    const open = await newHouse('Cooling, open');
    const shaded = await newHouse('Cooling, shaded', { shadeCloth: SUMMER_CLOTH });
    const july = { conditions: { designDate: '2026-07-21' } };
    const openResult = (await t.http.post(`/api/houses/${open.id}/cooling`).set(bearer(grower)).send(july).expect(200))
      .body;
    const shadedResult = (
      await t.http.post(`/api/houses/${shaded.id}/cooling`).set(bearer(grower)).send(july).expect(200)
    ).body;
    expect(shadedResult.shadeCloth).toEqual({ ...SUMMER_CLOTH, inPlaceOnDesignDate: true });
    expect(openResult.shadeCloth).toBeNull();
    expect(shadedResult.conditionsSource.peakInteriorLightLux).toBe('design day');
    expect(shadedResult.interiorLight.shadeTransmittance).toBe(0.5);
    expect(shadedResult.interiorLight.lux).toBeCloseTo(openResult.interiorLight.lux / 2, 6);
    expect(shadedResult.capacity.factors.light).toBeCloseTo(openResult.capacity.factors.light / 2, 9);
    shadedResult.designDay.hours.forEach((hour: { solarGainW: number }, index: number) => {
      expect(hour.solarGainW).toBeCloseTo(openResult.designDay.hours[index].solarGainW / 2, 6);
    });
    const words = shadedResult.assumptions.find((a: { key: string }) => a.key === 'shadeCloth');
    expect(words.value).toBe(
      'a shade cloth passing 50 % of the sun, in place May–September: in place on the design date',
    );

    // in January the same cloth is not in place and shades nothing
    const january = { conditions: { designDate: '2026-01-21' } };
    const winter = (await t.http.post(`/api/houses/${shaded.id}/cooling`).set(bearer(grower)).send(january).expect(200))
      .body;
    expect(winter.shadeCloth.inPlaceOnDesignDate).toBe(false);
    expect(winter.interiorLight.shadeTransmittance).toBe(1);
  });

  it('an alternative adds, changes or removes the cloth; an out-of-range one is refused naming the field', async () => {
    const house = await newHouse('With alternatives');
    const addAlternative = (body: object) =>
      t.http.post(`/api/houses/${house.id}/alternatives`).set(bearer(grower)).send(body);
    const added = (await addAlternative({ name: 'Summer shade', patch: { shadeCloth: SUMMER_CLOTH } }).expect(201))
      .body;
    expect(added.house.shadeCloth).toEqual(SUMMER_CLOTH);
    expect(added.changedFields).toEqual(['shadeCloth.solarTransmittance', 'shadeCloth.months']);
    expect(added.invalid).toBeNull();

    const shaded = (await patchHouse(house, { shadeCloth: SUMMER_CLOTH }).expect(200)).body as House;
    const denser = (
      await addAlternative({ name: 'Denser', patch: { shadeCloth: { solarTransmittance: 0.3 } } }).expect(201)
    ).body;
    expect(denser.house.shadeCloth).toEqual({ solarTransmittance: 0.3, months: SUMMER_CLOTH.months });
    const none = (await addAlternative({ name: 'No shade', patch: { shadeCloth: null } }).expect(201)).body;
    expect(none.house.shadeCloth).toBeNull();
    expect(none.changedFields).toEqual(['shadeCloth']);

    const bad = await addAlternative({ name: 'x', patch: { shadeCloth: { months: [13] } } }).expect(422);
    expect(bad.body.field).toMatch(/^patch\.shadeCloth\.months/);
    expect((await getHouse(shaded.id)).shadeCloth).toEqual(SUMMER_CLOTH);
  });
});
