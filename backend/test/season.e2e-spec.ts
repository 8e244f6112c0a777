import { parse } from 'csv-parse/sync';
import { hourlyCsv, HOURLY_MAPPING } from './temperature-csv';
import { houseBody } from './fixtures';
import { bearer, createTestApp, ifMatch, signIn, type TestApp, versionOf } from './test-app';

interface House {
  id: number;
  name: string;
}
interface Month {
  year: number;
  month: number;
  energyKWh: number;
  cost: number;
  degreeDaysKDay: number;
  fuelQuantitySi: number;
  fuelQuantityUs: number;
}
interface MeasureResult {
  kind: string;
  applicable: boolean;
  notApplicableReason: string | null;
  paybackStatus: 'years' | 'immediate' | 'enter-cost' | 'never' | 'not-applicable';
  paybackYears: number | null;
  paybackText: string;
  yearlyMoneySaved: number;
  costAmount: number | null;
  lightChange: { relativeChange: number } | null;
  season: { cost: number };
}

const sum = (values: number[]) => values.reduce((total, value) => total + value, 0);
const SEASON = { startDate: '2026-09-01', endDate: '2027-05-31' };

describe('season, calendars, fuel prices and the farm budget (e2e)', () => {
  let t: TestApp;
  let grower: string;
  let owner: string;
  let farmId: number;
  let houses: Record<'A' | 'B' | 'C', House>;

  beforeAll(async () => {
    t = await createTestApp();
    grower = await signIn(t, 'grower@example.com');
    owner = await signIn(t, 'owner@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body[0].id;
    const list: House[] = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(grower)).expect(200)).body;
    const byPrefix = (prefix: string) => list.find((house) => house.name.startsWith(prefix))!;
    houses = { A: byPrefix('House A'), B: byPrefix('House B'), C: byPrefix('Range C') };
  });
  afterAll(() => t.close());

  const season = (house: House, body: object = {}) =>
    t.http.post(`/api/houses/${house.id}/season`).set(bearer(grower)).send(body);

  describe('fuel prices', () => {
    it('seeds invented demo prices, labelled as invented', async () => {
      const res = (await t.http.get(`/api/farms/${farmId}/fuel-prices`).set(bearer(grower)).expect(200)).body;
      expect(res.farmId).toBe(farmId);
      const propane = res.prices.find((price: { fuelId: string }) => price.fuelId === 'propane');
      expect(propane).toMatchObject({ priceUnit: 'us', priceUnitLabel: 'US gal', fuelLabel: expect.any(String) });
      for (const price of res.prices) expect(price.note).toMatch(/invented/i);
    });

    it('refuses an unknown fuel and a fuel listed twice, naming the entry', async () => {
      const unknown = await t.http
        .put(`/api/farms/${farmId}/fuel-prices`)
        .set(bearer(grower))
        .set(ifMatch(await versionOf(t, grower, `/api/farms/${farmId}/fuel-prices`)))
        .send({ prices: [{ fuelId: 'unobtainium', pricePerUnit: 1, priceUnit: 'si' }] })
        .expect(422);
      expect(unknown.body.field).toBe('prices.0.fuelId');
      const twice = await t.http
        .put(`/api/farms/${farmId}/fuel-prices`)
        .set(bearer(grower))
        .set(ifMatch(await versionOf(t, grower, `/api/farms/${farmId}/fuel-prices`)))
        .send({
          prices: [
            { fuelId: 'propane', pricePerUnit: 1, priceUnit: 'si' },
            { fuelId: 'propane', pricePerUnit: 2, priceUnit: 'us' },
          ],
        })
        .expect(422);
      expect(twice.body.field).toBe('prices.1.fuelId');
      const negative = await t.http
        .put(`/api/farms/${farmId}/fuel-prices`)
        .set(bearer(grower))
        .set(ifMatch(await versionOf(t, grower, `/api/farms/${farmId}/fuel-prices`)))
        .send({ prices: [{ fuelId: 'propane', pricePerUnit: -1, priceUnit: 'si' }] })
        .expect(400);
      expect(negative.body.details[0].field).toBe('prices.0.pricePerUnit');
    });
  });

  describe('production calendar', () => {
    it('returns the demo calendar and keeps a replacement', async () => {
      const demo = (await t.http.get(`/api/houses/${houses.B.id}/calendar`).set(bearer(grower)).expect(200)).body;
      expect(demo).toEqual({
        houseId: houses.B.id,
        periods: [{ startMonthDay: '02-15', endMonthDay: '05-31', mode: 'heated', label: 'Spring bedding plants' }],
        version: 1,
      });
      expect(
        (await t.http.get(`/api/houses/${houses.C.id}/calendar`).set(bearer(grower)).expect(200)).body.periods,
      ).toEqual([]);

      const periods = [
        { startMonthDay: '11-15', endMonthDay: '03-31', mode: 'heated', nightHeatingC: 12, label: 'Winter crop' },
      ];
      const loaded = (await t.http.get(`/api/houses/${houses.C.id}/calendar`).set(bearer(grower)).expect(200)).body;
      const put = (
        await t.http
          .put(`/api/houses/${houses.C.id}/calendar`)
          .set(bearer(grower))
          .set(ifMatch(loaded.version))
          .send({ periods })
          .expect(200)
      ).body;
      expect(put.periods).toEqual(periods);
      expect(put.version).toBe(loaded.version + 1);
      expect(
        (await t.http.get(`/api/houses/${houses.C.id}/calendar`).set(bearer(grower)).expect(200)).body.periods,
      ).toEqual(periods);
      await t.http
        .put(`/api/houses/${houses.C.id}/calendar`)
        .set(bearer(grower))
        .set(ifMatch(put.version))
        .send({ periods: [] })
        .expect(200);
    });

    it('refuses an impossible date with 422 naming the period', async () => {
      const res = await t.http
        .put(`/api/houses/${houses.C.id}/calendar`)
        .set(bearer(grower))
        .set(ifMatch(await versionOf(t, grower, `/api/houses/${houses.C.id}/calendar`)))
        .send({ periods: [{ startMonthDay: '02-30', endMonthDay: '03-31', mode: 'heated' }] })
        .expect(422);
      expect(res.body.field).toBe('periods[0].startMonthDay');
      const badMode = await t.http
        .put(`/api/houses/${houses.C.id}/calendar`)
        .set(bearer(grower))
        .set(ifMatch(await versionOf(t, grower, `/api/houses/${houses.C.id}/calendar`)))
        .send({ periods: [{ startMonthDay: '01-01', endMonthDay: '03-31', mode: 'warm' }] })
        .expect(400);
      expect(badMode.body.details[0].field).toBe('periods.0.mode');
    });
  });

  describe('house season', () => {
    it('gives twelve months over a year, totals that add up and a fuel cost at the farm price', async () => {
      const res = await season(houses.C, { startDate: '2026-07-01', endDate: '2027-06-30' }).expect(200);
      const body = res.body;
      expect(body.houseId).toBe(houses.C.id);
      expect(body.monthly).toHaveLength(12);
      expect(body.monthly.map((m: Month) => m.month)).toEqual([7, 8, 9, 10, 11, 12, 1, 2, 3, 4, 5, 6]);
      expect(body.total.energyKWh).toBeGreaterThan(0);
      expect(body.total.cost).toBeGreaterThan(0);
      expect(sum(body.monthly.map((m: Month) => m.energyKWh))).toBeCloseTo(body.total.energyKWh, 3);
      // January needs more heat than July at this cold-winter site
      const january = body.monthly.find((m: Month) => m.month === 1);
      const july = body.monthly.find((m: Month) => m.month === 7);
      expect(january.energyKWh).toBeGreaterThan(july.energyKWh);

      expect(body.inputsUsed).toMatchObject({
        startDate: '2026-07-01',
        endDate: '2027-06-30',
        seasonFrom: 'request',
        climateSource: 'normals',
        fuelId: 'natural-gas',
        fuelFrom: 'house-heater',
        priceFrom: 'farm-fuel-prices',
        heaterEfficiency: 0.8,
        calendarPeriodCount: 0,
        timeZone: 'America/Chicago',
        utcOffsetHours: -6, // Central Standard Time (IANA tz database)
      });
      // the demo price is per therm, so cost = therms × price
      expect(body.fuel).toMatchObject({ fuelId: 'natural-gas', priceUnit: 'us', priceUnitLabel: 'therm' });
      expect(body.total.cost).toBeCloseTo(body.total.fuelQuantityUs * body.fuel.pricePerUnit, 6);
      // fuel burnt = heat ÷ efficiency
      expect(body.total.fuelInputKWh).toBeCloseTo(body.total.energyKWh / 0.8, 3);
      expect(body.cautions.join(' ')).toMatch(/carbon monoxide/);
      expect(body.assumptions.length).toBeGreaterThan(5);
      // Range C's six heaters hold it all year
      expect(body.total).toMatchObject({ unmetHeatKWh: 0, hoursBelowSetpoint: 0 });
      expect(body.heaterCapacity.caution).toBeNull();
      // where the heat goes: the parts less the sun are the heat delivered, the night sky its own part
      const breakdown = body.lossBreakdown;
      expect(breakdown.parts.map((part: { key: string }) => part.key)).toEqual([
        'roof',
        'sidewalls',
        'endwalls',
        'kneewall',
        'perimeter',
        'infiltration',
        'sky',
      ]);
      expect(
        sum(breakdown.parts.map((part: { energyKWh: number }) => part.energyKWh)) - breakdown.solarOffsetKWh,
      ).toBeCloseTo(body.total.energyKWh, 3);
      expect(breakdown.skyKWh).toBeGreaterThan(0);
      expect(body.assumptions.map((a: { key: string }) => a.key)).toEqual(
        expect.arrayContaining(['sky-cloud-cover', 'sky-dew-point', 'sky-roof-ir-transmittance', 'sky-night-only']),
      );
    });

    it("flags House B's hours below the setpoint: one unit heater gives less than its coldest hours need", async () => {
      const body = (await season(houses.B, SEASON).expect(200)).body;
      // demo House B: one heater, input 300,000 Btu/h × 0.80 = 240,000 Btu/h ≈ 70.3 kW output (1 Btu/h = 0.29307 W)
      expect(body.heaterCapacity.installedOutputW).toBeCloseTo(300_000 * 0.29307107 * 0.8, 0);
      expect(body.peak.heatW).toBeGreaterThan(body.heaterCapacity.installedOutputW);
      expect(body.total.hoursBelowSetpoint).toBeGreaterThan(0);
      expect(body.total.unmetHeatKWh).toBeGreaterThan(0);
      expect(sum(body.monthly.map((m: { hoursBelowSetpoint: number }) => m.hoursBelowSetpoint))).toBe(
        body.total.hoursBelowSetpoint,
      );
      expect(body.total.fuelInputKWh).toBeCloseTo(body.total.energyKWh / 0.8, 3);
      expect(body.heaterCapacity.caution).toMatch(/crop sits below its setpoint/);
      expect(body.heaterCapacity.caution).toContain(`${body.total.hoursBelowSetpoint} hours`);
      expect(body.degreeDays.steps[body.degreeDays.steps.length - 1].key).toBe('heater-capacity');

      const budget = (
        await t.http.post(`/api/farms/${farmId}/season-budget`).set(bearer(grower)).send(SEASON).expect(200)
      ).body;
      const inBudget = budget.houses.find((house: { houseId: number }) => house.houseId === houses.B.id);
      expect(inBudget.hoursBelowSetpoint).toBe(body.total.hoursBelowSetpoint);
      expect(inBudget.unmetHeatKWh).toBeCloseTo(body.total.unmetHeatKWh, 6);
      expect(inBudget.capacityCaution).toBe(body.heaterCapacity.caution);
    });

    it('cross-checks against degree-days worked out by hand from the farm climate normals', async () => {
      const body = (await season(houses.C, SEASON).expect(200)).body;
      const dd = body.degreeDays;
      // Hand arithmetic (no published value): days × (night setpoint 18 °C − monthly mean of the
      // farm's invented demo normals), September to May. The engine interpolates between months
      // and counts each day from its minimum and maximum, so agreement is expected within 10 %.
      const climate = (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(grower)).expect(200)).body.climate;
      const daysIn: Record<number, number> = { 9: 30, 10: 31, 11: 30, 12: 31, 1: 31, 2: 28, 3: 31, 4: 30, 5: 31 };
      const byHand = sum(
        climate.monthly
          .filter((m: { month: number }) => daysIn[m.month])
          .map(
            (m: { month: number; meanDailyMinC: number; meanDailyMaxC: number }) =>
              daysIn[m.month] * Math.max(0, 18 - (m.meanDailyMinC + m.meanDailyMaxC) / 2),
          ),
      );
      expect(dd.baseTemperatureC).toBe(18);
      expect(dd.degreeDaysKDay).toBeGreaterThan(byHand * 0.9);
      expect(dd.degreeDaysKDay).toBeLessThan(byHand * 1.1);
      expect(dd.degreeDaysFDay).toBeCloseTo(dd.degreeDaysKDay * 1.8, 6);
      expect(sum(body.monthly.map((m: Month) => m.degreeDaysKDay))).toBeCloseTo(dd.degreeDaysKDay, 3);
      // degree-day heat = UA × degree-days × 24 h
      expect(dd.energyKWh).toBeCloseTo((dd.uaWPerK * dd.degreeDaysKDay * 24) / 1000, 3);
      expect(dd.steps.map((s: { key: string }) => s.key)).toEqual([
        'degree-day',
        'hourly-curve',
        'day-setpoint',
        'curtain',
        'sky',
        'sun',
      ]);
      expect(dd.steps[5].energyKWh).toBeCloseTo(body.total.energyKWh, 3);
      expect(dd.hourlyDifferenceFraction).toBeCloseTo(body.total.energyKWh / dd.energyKWh - 1, 6);
    });

    it('defaults to the heating season in progress or coming, 1 September to 31 May', async () => {
      const body = (await season(houses.C).expect(200)).body;
      expect(body.inputsUsed.seasonFrom).toBe('default-heating-season');
      expect(body.period.startDate).toMatch(/^\d{4}-09-01$/);
      expect(body.period.endDate).toMatch(/^\d{4}-05-31$/);
      expect(Number(body.period.endDate.slice(0, 4)) - Number(body.period.startDate.slice(0, 4))).toBe(1);
      expect(body.monthly).toHaveLength(9);
    });

    it("heats only the days of the house's production calendar", async () => {
      const body = (await season(houses.B, SEASON).expect(200)).body;
      // the demo calendar heats 15 Feb – 31 May: 14 + 31 + 30 + 31 days
      expect(body.period.heatedDays).toBe(106);
      expect(body.inputsUsed.calendarPeriodCount).toBe(1);
      for (const month of body.monthly as Month[]) {
        if ([9, 10, 11, 12, 1].includes(month.month)) expect(month.energyKWh).toBe(0);
      }
      expect(body.monthly.find((m: Month) => m.month === 3).energyKWh).toBeGreaterThan(0);
    });

    it('takes the fuel, price and efficiency from the request over the defaults', async () => {
      const body = (
        await season(houses.C, {
          ...SEASON,
          fuelId: 'propane',
          pricePerUnit: 0.5,
          priceUnit: 'si',
          heaterEfficiency: 0.9,
        }).expect(200)
      ).body;
      expect(body.inputsUsed).toMatchObject({
        fuelId: 'propane',
        fuelFrom: 'request',
        priceFrom: 'request',
        heaterEfficiencyFrom: 'request',
        heaterEfficiency: 0.9,
      });
      expect(body.total.cost).toBeCloseTo(body.total.fuelQuantitySi * 0.5, 6);
    });

    it('refuses half a date range, a season over 366 days and an unknown fuel, naming the field', async () => {
      expect((await season(houses.C, { startDate: '2026-09-01' }).expect(422)).body.field).toBe('endDate');
      expect((await season(houses.C, { startDate: '2026-01-01', endDate: '2027-06-30' }).expect(422)).body.field).toBe(
        'endDate',
      );
      expect((await season(houses.C, { ...SEASON, fuelId: 'unobtainium' }).expect(422)).body.field).toBe('fuelId');
      const bad = await season(houses.C, { climateSource: 'guesswork' }).expect(400);
      expect(bad.body.details[0].field).toBe('climateSource');
    });

    it('needs a climate or a log (422, naming the field); without a price it gives heat and no cost', async () => {
      const farm = (
        await t.http
          .post('/api/farms')
          .set(bearer(owner))
          .send({ name: 'Bare farm', latitudeDeg: 44, longitudeDeg: -93, elevationM: 250, timeZone: 'America/Chicago' })
          .expect(201)
      ).body;
      const house = (
        await t.http
          .post(`/api/farms/${farm.id}/houses`)
          .set(bearer(owner))
          .send({
            ...houseBody('Bare house'),
            heaters: [{ count: 1, ratedInputW: 50000, efficiency: 0.8, fuelId: 'propane' }],
          })
          .expect(201)
      ).body;
      const post = (body: object) => t.http.post(`/api/houses/${house.id}/season`).set(bearer(owner)).send(body);
      expect((await post(SEASON).expect(422)).body.field).toBe('climateSource');

      const demoClimate = (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(owner)).expect(200)).body
        .climate;
      await t.http
        .put(`/api/farms/${farm.id}/climate`)
        .set(bearer(owner))
        .set(ifMatch(0))
        .send(demoClimate)
        .expect(200);
      const noPrice = (await post(SEASON).expect(200)).body;
      expect(noPrice.total.energyKWh).toBeGreaterThan(0);
      expect(noPrice.total.cost).toBeNull();
      expect(noPrice.inputsUsed).toMatchObject({ priceFrom: 'none', pricePerUnit: null, currency: 'USD' });
      const priced = (await post({ ...SEASON, pricePerUnit: 1.5, priceUnit: 'us' }).expect(200)).body;
      expect(priced.inputsUsed.priceFrom).toBe('request');
    });
  });

  describe('with a temperature log as the climate', () => {
    let logId: number;

    beforeAll(async () => {
      const res = await t.http
        .post(`/api/farms/${farmId}/temperature-logs`)
        .set(bearer(grower))
        .field('name', 'January, two weeks')
        .field('mapping', JSON.stringify(HOURLY_MAPPING))
        .attach('file', Buffer.from(hourlyCsv('2027-01-01', 14, -10)), {
          filename: 'january.csv',
          contentType: 'text/csv',
        })
        .expect(201);
      logId = res.body.id;
    });

    it('runs the season over the days the log covers', async () => {
      const body = (await season(houses.C, { climateSource: { temperatureLogId: logId } }).expect(200)).body;
      expect(body.inputsUsed).toMatchObject({
        climateSource: 'temperature-log',
        temperatureLogId: logId,
        seasonFrom: 'temperature-log',
      });
      expect(body.period).toMatchObject({ startDate: '2027-01-01', endDate: '2027-01-14', days: 14 });
      expect(body.monthly).toHaveLength(1);
      expect(body.total.energyKWh).toBeGreaterThan(0);
      expect(body.peak.outdoorC).toBeGreaterThanOrEqual(-15.01);
      // the log's mean is −10 °C, so its degree-days to 18 °C are close to 14 × 28 K·day
      expect(body.degreeDays.degreeDaysKDay).toBeGreaterThan(14 * 28 * 0.95);
      expect(body.degreeDays.degreeDaysKDay).toBeLessThan(14 * 28 * 1.05);
    });

    it('refuses dates the log does not cover, and a log that is not the farm’s, naming climateSource', async () => {
      const outside = await season(houses.C, { ...SEASON, climateSource: { temperatureLogId: logId } }).expect(422);
      expect(outside.body.field).toBe('climateSource');
      expect(outside.body.message).toMatch(/the log runs/);
      const missing = await season(houses.C, { climateSource: { temperatureLogId: 999_999 } }).expect(422);
      expect(missing.body.field).toBe('climateSource.temperatureLogId');
    });

    it('prices a night from the log', async () => {
      const body = (
        await t.http
          .post(`/api/houses/${houses.C.id}/night-demand`)
          .set(bearer(grower))
          .send({ date: '2027-01-05', climateSource: { temperatureLogId: logId } })
          .expect(200)
      ).body;
      expect(body.energyKWh).toBeGreaterThan(0);
      expect(body.minOutdoorC).toBeCloseTo(-15, 0);
    });
  });

  describe('one night', () => {
    it('runs from sunset to the next sunrise with hourly outdoor temperatures, heat and cost', async () => {
      const body = (
        await t.http
          .post(`/api/houses/${houses.A.id}/night-demand`)
          .set(bearer(grower))
          .send({ date: '2027-01-15' })
          .expect(200)
      ).body;
      expect(body.houseId).toBe(houses.A.id);
      expect(body.sunset.startsWith('2027-01-15T')).toBe(true);
      expect(body.sunrise.startsWith('2027-01-16T')).toBe(true);
      expect(body.sunset < body.sunrise).toBe(true);
      // recalled, not from a table: mid-January at 45.5° N the night lasts about 15 h, sunset near 17:00 CST
      expect(body.nightHours).toBeGreaterThan(14);
      expect(body.nightHours).toBeLessThan(16.5);
      expect(Number(body.sunset.slice(11, 13))).toBeGreaterThanOrEqual(16);
      expect(Number(body.sunset.slice(11, 13))).toBeLessThanOrEqual(17);
      expect(body.energyKWh).toBeGreaterThan(0);
      expect(body.cost).toBeGreaterThan(0);
      expect(body.hourly.length).toBeGreaterThanOrEqual(14);
      expect(body.nightSetpointC).toBe(17);
      for (const hour of body.hourly) expect(hour.outdoorC).toBeLessThan(0);
      expect(
        sum(body.hourly.map((h: { nightShare: number; heatW: number }) => (h.nightShare * h.heatW) / 1000)),
      ).toBeCloseTo(body.energyKWh, 6);
      // part of each hour's heat goes to the night sky through House A's IR film and from its coverings
      expect(
        sum(body.hourly.map((h: { nightShare: number; skyW: number }) => (h.nightShare * h.skyW) / 1000)),
      ).toBeCloseTo(body.skyKWh, 6);
      for (const hour of body.hourly) expect(hour.skyW).toBeGreaterThan(0);
      for (const hour of body.hourly) expect(hour.skyW).toBeLessThan(hour.heatW);
      expect(body.inputsUsed).toMatchObject({ fuelId: 'propane', priceFrom: 'farm-fuel-prices' });
    });

    it('needs a date', async () => {
      const res = await t.http.post(`/api/houses/${houses.A.id}/night-demand`).set(bearer(grower)).send({}).expect(400);
      expect(res.body.details[0].field).toBe('date');
    });
  });

  describe('measures', () => {
    it('ranks by payback, shortest first, with measures that never pay back last', async () => {
      const body = (
        await t.http
          .post(`/api/houses/${houses.B.id}/measures`)
          .set(bearer(grower))
          .send({
            ...SEASON,
            measures: [
              {
                kind: 'fuel-switch',
                costAmount: 1000,
                fuel: { fuelId: 'electricity', pricePerUnit: 0.5, priceUnit: 'si' },
                efficiency: 1,
              },
              { kind: 'second-poly-layer', costAmount: 3000 },
              { kind: 'sealing', costAmount: 800 },
              { kind: 'night-setpoint-lower', costAmount: 0, lowerByK: 2 },
              { kind: 'perimeter-insulation', costAmount: 1500 },
            ],
          })
          .expect(200)
      ).body;
      expect(body.defaultsUsed).toBe(false);
      expect(body.baseline.energyKWh).toBeGreaterThan(0);
      const results: MeasureResult[] = body.measures;
      expect(results).toHaveLength(5);
      const paying = results.filter((m) => m.paybackYears !== null);
      const never = results.filter((m) => m.paybackYears === null);
      expect(never.map((m) => m.kind)).toEqual(['fuel-switch']);
      expect(never[0].paybackStatus).toBe('never');
      expect(results.find((m) => m.kind === 'night-setpoint-lower')).toMatchObject({
        paybackStatus: 'immediate',
        paybackYears: 0,
      });
      expect(never[0].paybackText).toBe('never');
      expect(never[0].yearlyMoneySaved).toBeLessThan(0);
      expect(results[results.length - 1].kind).toBe('fuel-switch');
      for (let i = 1; i < paying.length; i++)
        expect(paying[i].paybackYears!).toBeGreaterThanOrEqual(paying[i - 1].paybackYears!);
      expect(results[0].kind).toBe('night-setpoint-lower');
      // payback = cost ÷ (the baseline season's cost − the season's cost with the measure): two
      // separate season runs in the response, not the saving the API computed
      for (const [kind, cost] of [
        ['second-poly-layer', 3000],
        ['sealing', 800],
        ['perimeter-insulation', 1500],
      ] as const) {
        const measure = results.find((m) => m.kind === kind)!;
        const moneySaved = body.baseline.cost - measure.season.cost;
        expect(moneySaved).toBeGreaterThan(0);
        expect(measure.paybackStatus).toBe('years');
        expect(Math.abs(measure.paybackYears! / (cost / moneySaved) - 1)).toBeLessThan(1e-9);
      }
      const layer = results.find((m) => m.kind === 'second-poly-layer')!;
      expect(layer.yearlyMoneySaved).toBeGreaterThan(0);
      expect(layer.lightChange!.relativeChange).toBeLessThan(0);
    });

    it('compares the default measures that apply, without costs, when the list is empty', async () => {
      const body = (
        await t.http
          .post(`/api/houses/${houses.B.id}/measures`)
          .set(bearer(grower))
          .send({ ...SEASON, measures: [] })
          .expect(200)
      ).body;
      expect(body.defaultsUsed).toBe(true);
      expect(body.notes[0]).toMatch(/cost/);
      const kinds = body.measures.map((m: MeasureResult) => m.kind);
      // House B: single poly, no curtain, perimeter not insulated
      expect(kinds).toEqual(
        expect.arrayContaining([
          'second-poly-layer',
          'thermal-curtain',
          'perimeter-insulation',
          'night-setpoint-lower',
        ]),
      );
      for (const measure of body.measures as MeasureResult[]) {
        expect(measure).toMatchObject({
          costAmount: null,
          applicable: true,
          notApplicableReason: null,
          paybackStatus: 'enter-cost',
          paybackYears: null,
        });
        expect(measure.paybackText).toBe('enter a cost');
      }
      const savings = body.measures.map((m: MeasureResult) => m.yearlyMoneySaved);
      expect(savings).toEqual([...savings].sort((a: number, b: number) => b - a));
    });

    it("leaves out of House A's defaults what it already has (double poly with IR film); its insulated perimeter still lacks a kneewall", async () => {
      const body = (
        await t.http
          .post(`/api/houses/${houses.A.id}/measures`)
          .set(bearer(grower))
          .send({ ...SEASON, measures: [] })
          .expect(200)
      ).body;
      const kinds = body.measures.map((m: MeasureResult) => m.kind);
      expect(kinds).not.toContain('second-poly-layer');
      // the perimeter is insulated but the house has no kneewall: the measure builds one of foam board
      expect(kinds).toContain('perimeter-insulation');
      expect(kinds).toContain('thermal-curtain');
      for (const measure of body.measures as MeasureResult[]) expect(measure.applicable).toBe(true);
    });

    it('lists measures that do not apply last, with the reason and no payback; a fuel switch without a price is one of them', async () => {
      const body = (
        await t.http
          .post(`/api/houses/${houses.A.id}/measures`)
          .set(bearer(grower))
          .send({
            ...SEASON,
            measures: [
              { kind: 'second-poly-layer', costAmount: 3000 },
              { kind: 'fuel-switch', costAmount: 1000, fuel: { fuelId: 'natural-gas' } },
              { kind: 'night-setpoint-lower', lowerByK: 0 },
              { kind: 'thermal-curtain', costAmount: 9000 },
              { kind: 'later-start' },
            ],
          })
          .expect(200)
      ).body;
      const results: MeasureResult[] = body.measures;
      expect(results.map((m) => m.paybackStatus)).toEqual([
        'years',
        'enter-cost',
        'not-applicable',
        'not-applicable',
        'not-applicable',
      ]);
      expect(results.slice(2).map((m) => m.kind)).toEqual(['second-poly-layer', 'fuel-switch', 'night-setpoint-lower']);
      for (const measure of results.slice(2)) {
        expect(measure).toMatchObject({
          applicable: false,
          paybackYears: null,
          paybackText: 'not applicable',
          yearlyMoneySaved: 0,
        });
        expect(measure.notApplicableReason).toEqual(expect.any(String));
      }
      expect(results[3].notApplicableReason).toMatch(/price/);
    });

    it('names a bad measure setting', async () => {
      const res = await t.http
        .post(`/api/houses/${houses.B.id}/measures`)
        .set(bearer(grower))
        .send({ ...SEASON, measures: [{ kind: 'thermal-curtain', costAmount: 100, curtainId: 'no-such-curtain' }] })
        .expect(422);
      expect(res.body.field).toBe('measures[0].curtainId');
    });
  });

  describe('farm season budget', () => {
    it('sums the houses, by fuel and by month, each as its own season run', async () => {
      const budget = (
        await t.http.post(`/api/farms/${farmId}/season-budget`).set(bearer(grower)).send(SEASON).expect(200)
      ).body;
      expect(budget).toMatchObject({
        farmId,
        ...SEASON,
        seasonFrom: 'request',
        climateSource: 'normals',
        costComplete: true,
      });
      expect(budget.houses).toHaveLength(3);
      for (const house of budget.houses) {
        const own = (await season({ id: house.houseId, name: house.name }, SEASON).expect(200)).body;
        expect(house.cost).toBeCloseTo(own.total.cost, 6);
        expect(house.energyKWh).toBeCloseTo(own.total.energyKWh, 6);
        expect(house.fuelId).toBe(own.fuel.fuelId);
      }
      expect(budget.totalCost).toBeCloseTo(sum(budget.houses.map((h: { cost: number }) => h.cost)), 6);
      expect(budget.totalEnergyKWh).toBeCloseTo(sum(budget.houses.map((h: { energyKWh: number }) => h.energyKWh)), 6);
      expect(budget.byFuel.map((f: { fuelId: string }) => f.fuelId).sort()).toEqual(['natural-gas', 'propane']);
      const gas = budget.byFuel.find((f: { fuelId: string }) => f.fuelId === 'natural-gas');
      expect(gas.houseCount).toBe(2);
      expect(gas.fuelQuantityUs).toBeCloseTo(
        sum(
          budget.houses
            .filter((h: { fuelId: string }) => h.fuelId === 'natural-gas')
            .map((h: { fuelQuantityUs: number }) => h.fuelQuantityUs),
        ),
        6,
      );
      expect(sum(budget.byFuel.map((f: { cost: number }) => f.cost))).toBeCloseTo(budget.totalCost, 6);
      expect(budget.monthly).toHaveLength(9);
      expect(sum(budget.monthly.map((m: { cost: number }) => m.cost))).toBeCloseTo(budget.totalCost, 6);
      expect(sum(budget.monthly.map((m: { energyKWh: number }) => m.energyKWh))).toBeCloseTo(budget.totalEnergyKWh, 6);
    });

    it('exports CSV in US units with the units in the header', async () => {
      const budget = (
        await t.http.post(`/api/farms/${farmId}/season-budget`).set(bearer(grower)).send(SEASON).expect(200)
      ).body;
      const res = await t.http
        .get(`/api/farms/${farmId}/season-budget.csv`)
        .query({ units: 'us', ...SEASON })
        .set(bearer(grower))
        .buffer(true)
        .parse((response, done) => {
          let text = '';
          response.on('data', (chunk: Buffer) => (text += chunk.toString('utf8')));
          response.on('end', () => done(null, text));
        })
        .expect(200);
      expect(res.headers['content-type']).toMatch(/^text\/csv/);
      expect(res.headers['content-disposition']).toMatch(/^attachment; filename=".*-us\.csv"$/);
      // A byte-order mark first, so that spreadsheets read the file as UTF-8; every field quoted.
      expect((res.body as string).charCodeAt(0)).toBe(0xfeff);
      expect((res.body as string).slice(1, 8)).toBe('"House"');
      const lines = parse(res.body as string, { bom: true }) as string[][];
      const header = lines[0];
      expect(header).toContain('Heat delivered (MMBtu)');
      expect(header.some((cell) => cell.endsWith('(US gal)'))).toBe(true);
      expect(header.some((cell) => cell.endsWith('(therm)'))).toBe(true);
      // one row per house per month, a total per house, the farm's months and its total
      expect(lines).toHaveLength(1 + 3 * 9 + 3 + 9 + 1);
      const last = lines[lines.length - 1];
      expect(last[0]).toBe('All houses');
      expect(last[last.length - 1]).toBe(budget.totalCost.toFixed(2));
      // heat in MMBtu: kWh ÷ 293.07
      expect(Number(last[4])).toBeCloseTo(budget.totalEnergyKWh / 293.07107, 2);
    });

    it('exports CSV in SI units by default', async () => {
      const res = await t.http
        .get(`/api/farms/${farmId}/season-budget.csv`)
        .query(SEASON)
        .set(bearer(grower))
        .expect(200);
      const header = (parse(res.text, { bom: true }) as string[][])[0];
      expect(header).toContain('Heat delivered (kWh)');
      expect(header.some((cell) => cell.endsWith('(L)'))).toBe(true);
      expect(header.some((cell) => cell.endsWith('(m³)'))).toBe(true);
    });

    it('neutralises a house name a spreadsheet would run as a formula', async () => {
      const budget = (
        await t.http.post(`/api/farms/${farmId}/season-budget`).set(bearer(grower)).send(SEASON).expect(200)
      ).body;
      const houseId = budget.houses[0].houseId as number;
      const original = budget.houses[0].name as string;
      const risky = ' =HYPERLINK("http://example.com","x")';
      const stored = (
        await t.http
          .patch(`/api/houses/${houseId}`)
          .set(bearer(grower))
          .set(ifMatch(await versionOf(t, grower, `/api/houses/${houseId}`)))
          .send({ name: risky })
          .expect(200)
      ).body.name as string;
      try {
        const res = await t.http
          .get(`/api/farms/${farmId}/season-budget.csv`)
          .query(SEASON)
          .set(bearer(grower))
          .expect(200);
        const names = (parse(res.text, { bom: true }) as string[][]).map((row) => row[0]);
        expect(names).toContain(`'${stored}`);
        expect(names.some((name) => /^\s*=/.test(name))).toBe(false);
      } finally {
        await t.http
          .patch(`/api/houses/${houseId}`)
          .set(bearer(grower))
          .set(ifMatch(await versionOf(t, grower, `/api/houses/${houseId}`)))
          .send({ name: original })
          .expect(200);
      }
    });
  });
});
