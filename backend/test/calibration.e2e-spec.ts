import { houseBody } from './fixtures';
import { hourlyCsv, HOURLY_MAPPING } from './temperature-csv';
import { bearer, createTestApp, ifMatch, signIn, type TestApp } from './test-app';

interface House {
  id: number;
  name: string;
}
interface FuelRecord {
  id: number;
  quantity: number;
  quantityUnit: string;
  houseIds: number[];
  version: number;
  fuelEnergyKWh: number;
}
interface Period {
  recordId: number;
  climateFrom: 'temperature-log' | 'normals';
  billedQuantity: number;
  handbookQuantity: number;
  fittedQuantity: number | null;
  usedInFit: boolean;
}
interface Meter {
  key: string;
  fitted: boolean;
  factor: number;
  factorLow90: number;
  factorHigh90: number;
  nmbePercent: number;
  cvRmsePercent: number;
  meetsGuideline14: boolean;
  verdict: string;
  meaning: string;
  periods: Period[];
}

// Five propane deliveries of last winter (invented), each from the day after the previous fill.
const DELIVERIES: Array<[string, string, number]> = [
  ['2025-10-20', '2025-11-30', 900],
  ['2025-12-01', '2025-12-31', 1400],
  ['2026-01-01', '2026-01-31', 1700],
  ['2026-02-01', '2026-02-28', 1300],
  ['2026-03-01', '2026-04-05', 1000],
];

describe('fuel records and the calibration against them (e2e)', () => {
  let t: TestApp;
  let grower: string;
  let adviser: string;
  let farmId: number;
  let houses: Record<'A' | 'B' | 'C', House>;
  const records: FuelRecord[] = [];

  beforeAll(async () => {
    t = await createTestApp();
    grower = await signIn(t, 'grower@example.com');
    adviser = await signIn(t, 'adviser@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body[0].id;
    const list: House[] = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(grower)).expect(200)).body;
    const byPrefix = (prefix: string) => list.find((house) => house.name.startsWith(prefix))!;
    houses = { A: byPrefix('House A'), B: byPrefix('House B'), C: byPrefix('Range C') };
  });
  afterAll(() => t.close());

  const post = (body: object, token = grower) =>
    t.http.post(`/api/farms/${farmId}/fuel-records`).set(bearer(token)).send(body);
  const propane = (index: number) => {
    const [startDate, endDate, quantity] = DELIVERIES[index];
    return { fuelId: 'propane', quantity, quantityUnit: 'US gal', startDate, endDate, houseIds: [houses.A.id] };
  };
  const listRecords = async (): Promise<FuelRecord[]> =>
    (await t.http.get(`/api/farms/${farmId}/fuel-records`).set(bearer(grower)).expect(200)).body;
  const calibrate = () => t.http.post(`/api/farms/${farmId}/calibrations`).set(bearer(grower));

  describe('bad input answers 400 naming the field, and stores nothing', () => {
    it.each([
      [
        'an end before the start',
        { startDate: '2026-02-10', endDate: '2026-02-01' },
        'endDate',
        /ends .* before it starts/,
      ],
      ['a quantity of zero', { quantity: 0 }, 'quantity', /more than zero/],
      ['a unit the fuel is not sold in', { quantityUnit: 'therm' }, 'quantityUnit', /counted in L or US gal/],
      ['an unknown fuel', { fuelId: 'unobtainium' }, 'fuelId', /not a fuel/],
    ])('%s', async (_what, change, field, message) => {
      const res = await post({ ...propane(0), ...change }).expect(400);
      const detail = res.body.details.find((entry: { field: string }) => entry.field === field);
      expect(detail.message).toMatch(message);
      expect(res.body.message).not.toMatch(/quantityUnit|houseIds|endDate/);
    });

    it('a house of another farm', async () => {
      const other = await t.http
        .post('/api/farms')
        .set(bearer(grower))
        .send({ name: 'Other farm', latitudeDeg: 45, longitudeDeg: -94, elevationM: 300, timeZone: 'America/Chicago' })
        .expect(201);
      const stranger = await t.http
        .post(`/api/farms/${other.body.id}/houses`)
        .set(bearer(grower))
        .send(houseBody('Stranger'))
        .expect(201);
      const strangerId = stranger.body.id;
      const res = await post({ ...propane(0), houseIds: [strangerId] }).expect(400);
      expect(res.body.details).toEqual([{ field: 'houseIds', message: expect.stringMatching(/is not on this farm/) }]);
      expect(await listRecords()).toEqual([]);
    });
  });

  describe('access', () => {
    it('an adviser reads the records and calibrations but cannot write them', async () => {
      await t.http.get(`/api/farms/${farmId}/fuel-records`).set(bearer(adviser)).expect(200);
      await t.http.get(`/api/farms/${farmId}/calibrations`).set(bearer(adviser)).expect(200);
      await post(propane(0), adviser).expect(403);
      await t.http.post(`/api/farms/${farmId}/calibrations`).set(bearer(adviser)).expect(403);
    });
  });

  describe('entering records and refusing a fit from too few', () => {
    it('refuses to calibrate from two deliveries, saying why', async () => {
      for (const index of [0, 1]) records.push((await post(propane(index)).expect(201)).body);
      const res = await calibrate().expect(422);
      expect(res.body.message).toMatch(/at least 3 bills with heating/);
      expect((await t.http.get(`/api/farms/${farmId}/calibrations`).set(bearer(grower))).body).toEqual([]);
    });

    it('adds the other three and converts each to the energy it holds', async () => {
      for (const index of [2, 3, 4]) records.push((await post(propane(index)).expect(201)).body);
      // 91,333 Btu per US gal (reference-data/fuels.json) = 26.767 kWh
      expect(records[2].fuelEnergyKWh / records[2].quantity).toBeCloseTo(26.767, 3);
    });

    it('updates need If-Match: 428 without, 409 on an old version, 200 with the version loaded', async () => {
      const path = `/api/fuel-records/${records[0].id}`;
      await t.http.patch(path).set(bearer(grower)).send({ quantity: 950 }).expect(428);
      const saved = await t.http.patch(path).set(bearer(grower)).set(ifMatch(1)).send({ quantity: 950 }).expect(200);
      expect(saved.body).toMatchObject({ quantity: 950, version: 2 });
      const stale = await t.http.patch(path).set(bearer(grower)).set(ifMatch(1)).send({ quantity: 990 }).expect(409);
      expect(stale.body.current.quantity).toBe(950);
      const bad = await t.http
        .patch(path)
        .set(bearer(grower))
        .set(ifMatch(2))
        .send({ endDate: '2025-10-01' })
        .expect(400);
      expect(bad.body.details[0].field).toBe('endDate');
      records[0] = saved.body;
    });
  });

  describe('CSV upload with confirmed columns', () => {
    const gasCsv = (badRow = false) =>
      [
        'From,To,Therms used,Houses,Amount',
        '2025-11-01,2025-11-30,2100,House B – bedding plants; Range C – cucumbers,"$1,680.00"',
        badRow
          ? '2025-12-31,2025-12-01,0,House B – bedding plants; Glasshouse Z,2400'
          : '2025-12-01,2025-12-31,3300,House B – bedding plants; Range C – cucumbers,2640',
        '2026-01-01,2026-01-31,3900,House B – bedding plants; Range C – cucumbers,3120',
        '2026-02-01,2026-02-28,3100,House B – bedding plants; Range C – cucumbers,2480',
      ].join('\n');
    const mapping = {
      startColumn: 'From',
      endColumn: 'To',
      quantityColumn: 'Therms used',
      housesColumn: 'Houses',
      costColumn: 'Amount',
      fuelId: 'natural-gas',
      unit: 'therm',
    };

    it('inspects the file and proposes its columns', async () => {
      const res = await t.http
        .post(`/api/farms/${farmId}/fuel-records/inspect`)
        .set(bearer(grower))
        .attach('file', Buffer.from(gasCsv()), { filename: 'gas.csv', contentType: 'text/csv' })
        .expect(200);
      expect(res.body).toMatchObject({ rowCount: 4, columns: ['From', 'To', 'Therms used', 'Houses', 'Amount'] });
      expect(res.body.proposed).toMatchObject({
        startColumn: 'From',
        quantityColumn: 'Therms used',
        housesColumn: 'Houses',
      });
    });

    it('a bad row stores nothing and names the row and each field', async () => {
      const before = (await listRecords()).length;
      const res = await t.http
        .post(`/api/farms/${farmId}/fuel-records/upload`)
        .set(bearer(grower))
        .field('mapping', JSON.stringify(mapping))
        .attach('file', Buffer.from(gasCsv(true)), { filename: 'gas.csv', contentType: 'text/csv' })
        .expect(400);
      const messages = res.body.details.map((detail: { message: string }) => detail.message);
      expect(messages).toEqual(
        expect.arrayContaining([
          expect.stringMatching(/^Row 3, quantity: the quantity must be more than zero/),
          expect.stringMatching(/^Row 3, end date: the period ends/),
          expect.stringMatching(/^Row 3, houses: there is no house called "Glasshouse Z"/),
        ]),
      );
      expect((await listRecords()).length).toBe(before);
    });

    it('a good file stores every row', async () => {
      const res = await t.http
        .post(`/api/farms/${farmId}/fuel-records/upload`)
        .set(bearer(grower))
        .field('mapping', JSON.stringify(mapping))
        .attach('file', Buffer.from(gasCsv()), { filename: 'gas.csv', contentType: 'text/csv' })
        .expect(201);
      expect(res.body.created).toBe(4);
      expect(res.body.records[0]).toMatchObject({
        fuelId: 'natural-gas',
        quantityUnit: 'therm',
        cost: 1680,
        houseIds: [houses.B.id, houses.C.id].sort((a, b) => a - b),
      });
    });
  });

  describe('calibration', () => {
    let meter: Meter;

    beforeAll(async () => {
      // a log covering January: that bill runs on the logged hours, the others on the normals
      await t.http
        .post(`/api/farms/${farmId}/temperature-logs`)
        .set(bearer(grower))
        .field('name', 'January 2026')
        .field('mapping', JSON.stringify(HOURLY_MAPPING))
        .attach('file', Buffer.from(hourlyCsv('2025-12-31', 33, -8)), { filename: 'jan.csv', contentType: 'text/csv' })
        .expect(201);
    });

    it('budget "as calibrated" before any calibration falls back to the handbook and says so', async () => {
      const res = await t.http
        .post(`/api/farms/${farmId}/season-budget`)
        .set(bearer(grower))
        .send({ heatLossBasis: 'calibrated' })
        .expect(200);
      expect(res.body).toMatchObject({ heatLossBasisRequested: 'calibrated', heatLossBasis: 'handbook' });
      expect(res.body.heatLossBasisStatement).toMatch(/no calibration against fuel bills yet/);
    });

    it('fits one factor per meter, with its interval, Guideline 14 statistics and plain words', async () => {
      const res = await calibrate().expect(201);
      expect(res.body.recordCount).toBe(9);
      expect(res.body.meters.map((m: Meter) => m.key).sort()).toEqual(
        [`natural-gas:${[houses.B.id, houses.C.id].sort((a, b) => a - b).join(',')}`, `propane:${houses.A.id}`].sort(),
      );
      meter = res.body.meters.find((m: Meter) => m.key === `propane:${houses.A.id}`);
      expect(meter.fitted).toBe(true);
      expect(meter.factorLow90).toBeLessThan(meter.factor);
      expect(meter.factorHigh90).toBeGreaterThan(meter.factor);
      expect(typeof meter.nmbePercent).toBe('number');
      expect(meter.verdict).toMatch(/ASHRAE Guideline 14/);
      expect(meter.meaning.length).toBeGreaterThan(20);
      const january = meter.periods.find((period) => period.recordId === records[2].id)!;
      expect(january.climateFrom).toBe('temperature-log');
      expect(meter.periods.filter((period) => period.climateFrom === 'normals')).toHaveLength(4);
    });

    it('fits bills 1.2 × the handbook model to a factor a little under 1.2 when re-run on new figures', async () => {
      // (a period in which the house stands empty by its calendar has no heating to scale)
      for (const period of meter.periods.filter((p) => p.usedInFit)) {
        const record = (await listRecords()).find((r) => r.id === period.recordId)!;
        await t.http
          .patch(`/api/fuel-records/${record.id}`)
          .set(bearer(grower))
          .set(ifMatch(record.version))
          .send({ quantity: Math.round(period.handbookQuantity * 1.2 * 10) / 10 })
          .expect(200);
      }
      const res = await calibrate().expect(201);
      const refit: Meter = res.body.meters.find((m: Meter) => m.key === `propane:${houses.A.id}`);
      // Under 1.2: the factor scales the loss, but the sun's gain that offsets part of it stays
      // the same, so k·loss − sun = 1.2·(loss − sun) needs k = 1.2 − 0.2·sun/loss.
      expect(refit.factor).toBeGreaterThan(1.1);
      expect(refit.factor).toBeLessThan(1.2);
      expect(refit.nmbePercent).toBeCloseTo(0, 0);
      expect(refit.meetsGuideline14).toBe(true);
      expect(refit.meaning).toMatch(/about 1\d % more heat loss/i);
      const list = (await t.http.get(`/api/farms/${farmId}/calibrations`).set(bearer(grower)).expect(200)).body;
      expect(list).toHaveLength(2);
      expect(list[0].id).toBe(res.body.id);
      await t.http.get(`/api/calibrations/${res.body.id}`).set(bearer(adviser)).expect(200);
    });

    it('the season "as calibrated" applies the factor and says so', async () => {
      const season = (heatLossBasis?: string) =>
        t.http
          .post(`/api/houses/${houses.A.id}/season`)
          .set(bearer(grower))
          .send({ startDate: '2025-11-01', endDate: '2026-03-31', ...(heatLossBasis ? { heatLossBasis } : {}) })
          .expect(200);
      const handbook = (await season()).body;
      const calibrated = (await season('calibrated')).body;
      expect(handbook.inputsUsed).toMatchObject({ heatLossBasis: 'handbook', heatLossFactor: 1 });
      expect(calibrated.inputsUsed).toMatchObject({ heatLossBasis: 'calibrated', heatLossBasisNote: null });
      const factor = calibrated.inputsUsed.heatLossFactor;
      expect(factor).toBeGreaterThan(1.1);
      expect(calibrated.heatLoss.uaCurtainOpenWPerK).toBeCloseTo(handbook.heatLoss.uaCurtainOpenWPerK * factor, 6);
      expect(calibrated.total.energyKWh).toBeGreaterThan(handbook.total.energyKWh);
      expect(calibrated.assumptions.map((a: { key: string }) => a.key)).toContain('heat-loss-factor');
    });

    it('the side-by-side runs as calibrated too', async () => {
      const res = await t.http
        .post(`/api/houses/${houses.A.id}/side-by-side`)
        .set(bearer(grower))
        .send({ heatLossBasis: 'calibrated' })
        .expect(200);
      expect(res.body.seasonInputsUsed).toMatchObject({ heatLossBasis: 'calibrated' });
    });

    it('the budget states it is "as calibrated" and each house its factor', async () => {
      const res = await t.http
        .post(`/api/farms/${farmId}/season-budget`)
        .set(bearer(grower))
        .send({ heatLossBasis: 'calibrated' })
        .expect(200);
      expect(res.body.heatLossBasisStatement).toMatch(/^As calibrated against the farm's fuel bills/);
      expect(res.body.notes[0]).toBe(res.body.heatLossBasisStatement);
      const houseA = res.body.houses.find((house: { houseId: number }) => house.houseId === houses.A.id);
      expect(houseA.heatLossBasis).toBe('calibrated');
      expect(houseA.heatLossFactor).toBeGreaterThan(1.1);
      const handbook = await t.http.post(`/api/farms/${farmId}/season-budget`).set(bearer(grower)).send({}).expect(200);
      expect(handbook.body.heatLossBasis).toBe('handbook');
      const csv = await t.http
        .get(`/api/farms/${farmId}/season-budget.csv?units=us&heatLossBasis=calibrated`)
        .set(bearer(grower))
        .expect(200);
      expect(csv.headers['content-disposition']).toMatch(/-as-calibrated-us\.csv"$/);
    });

    it('a house changed after the calibration keeps its factor, with a note to run it again', async () => {
      const path = `/api/houses/${houses.A.id}`;
      const house = (await t.http.get(path).set(bearer(grower)).expect(200)).body;
      await t.http
        .patch(path)
        .set(bearer(grower))
        .set(ifMatch(house.version))
        .send({ setpoints: { ...house.setpoints, nightHeatingC: house.setpoints.nightHeatingC - 1 } })
        .expect(200);
      const res = await t.http
        .post(`/api/farms/${farmId}/season-budget`)
        .set(bearer(grower))
        .send({ heatLossBasis: 'calibrated' })
        .expect(200);
      expect(res.body.houses.find((h: { houseId: number }) => h.houseId === houses.A.id).heatLossBasis).toBe(
        'calibrated',
      );
      expect(res.body.heatLossBasisStatement).toMatch(/House A – tomatoes changed after the calibration/);
    });

    it('a deleted house leaves the bills that served it, without it', async () => {
      await t.http.delete(`/api/houses/${houses.C.id}`).set(bearer(grower)).expect(204);
      const gas = (await listRecords()).filter((record) => record.quantityUnit === 'therm');
      expect(gas).toHaveLength(4);
      for (const record of gas) expect(record.houseIds).toEqual([houses.B.id]);
    });

    it('deleting a record takes it out of the list', async () => {
      await t.http.delete(`/api/fuel-records/${records[4].id}`).set(bearer(adviser)).expect(403);
      await t.http.delete(`/api/fuel-records/${records[4].id}`).set(bearer(grower)).expect(204);
      expect((await listRecords()).some((record) => record.id === records[4].id)).toBe(false);
    });
  });
});
