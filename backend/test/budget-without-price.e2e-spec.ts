import { parse } from 'csv-parse/sync';
import { houseBody } from './fixtures';
import { hourlyCsv, HOURLY_MAPPING } from './temperature-csv';
import { bearer, createTestApp, ifMatch, signIn, type TestApp, versionOf } from './test-app';

const SEASON = { startDate: '2026-11-01', endDate: '2027-03-31' };
const FARM = { latitudeDeg: 44, longitudeDeg: -93, elevationM: 250, timeZone: 'America/Chicago' };

/** A new farm's first season and budget: no fuel price yet, a currency of its own, climate from its log. */
describe('a budget that never dead-ends, currencies and climate from a log (e2e)', () => {
  let t: TestApp;
  let owner: string;
  let farmId: number;
  let houseId: number;

  beforeAll(async () => {
    t = await createTestApp();
    owner = await signIn(t, 'owner@example.com');
    const demoFarmId = (await t.http.get('/api/farms').set(bearer(owner)).expect(200)).body[0].id as number;
    const demoClimate = (await t.http.get(`/api/farms/${demoFarmId}/climate`).set(bearer(owner)).expect(200)).body
      .climate;
    const farm = (
      await t.http
        .post('/api/farms')
        .set(bearer(owner))
        .send({ name: 'New farm', ...FARM, currency: 'EUR' })
        .expect(201)
    ).body;
    farmId = farm.id;
    expect(farm.currency).toBe('EUR');
    await t.http.put(`/api/farms/${farmId}/climate`).set(bearer(owner)).set(ifMatch(0)).send(demoClimate).expect(200);
    houseId = (
      await t.http
        .post(`/api/farms/${farmId}/houses`)
        .set(bearer(owner))
        .send({
          ...houseBody('First house'),
          heaters: [{ count: 2, ratedInputW: 60000, efficiency: 0.8, fuelId: 'propane' }],
        })
        .expect(201)
    ).body.id;
  });
  afterAll(() => t.close());

  describe('currency', () => {
    it('defaults to USD, takes a valid ISO 4217 code and refuses others with a clear message (400)', async () => {
      const plain = (
        await t.http
          .post('/api/farms')
          .set(bearer(owner))
          .send({ name: 'Dollar farm', ...FARM })
          .expect(201)
      ).body;
      expect(plain.currency).toBe('USD');
      for (const currency of ['XYZ', 'eur', 'EURO', '', 12]) {
        const refused = await t.http
          .post('/api/farms')
          .set(bearer(owner))
          .send({ name: 'Bad currency', ...FARM, currency })
          .expect(400);
        expect(refused.body.details[0].field).toBe('currency');
        expect(refused.body.details[0].message).toMatch(/three-letter ISO 4217 code such as USD, EUR or CAD/);
      }
      const patched = await t.http
        .patch(`/api/farms/${plain.id}`)
        .set(bearer(owner))
        .set(ifMatch(plain.version))
        .send({ currency: 'CAD' })
        .expect(200);
      expect(patched.body.currency).toBe('CAD');
      await t.http
        .patch(`/api/farms/${plain.id}`)
        .set(bearer(owner))
        .set(ifMatch(patched.body.version))
        .send({ currency: 'ZZZ' })
        .expect(400);
      expect((await t.http.get(`/api/farms/${plain.id}`).set(bearer(owner)).expect(200)).body.currency).toBe('CAD');
    });
  });

  describe('without a fuel price', () => {
    it('the season gives heat and fuel, no cost, and says the currency (200)', async () => {
      const body = (await t.http.post(`/api/houses/${houseId}/season`).set(bearer(owner)).send(SEASON).expect(200))
        .body;
      expect(body.total.energyKWh).toBeGreaterThan(0);
      expect(body.total.fuelQuantityUs).toBeGreaterThan(0);
      expect(body.total.cost).toBeNull();
      expect(body.monthly.every((month: { cost: number | null }) => month.cost === null)).toBe(true);
      expect(body.degreeDays.cost).toBeNull();
      expect(body.fuel.pricePerUnit).toBeNull();
      expect(body.inputsUsed).toMatchObject({ priceFrom: 'none', pricePerUnit: null, currency: 'EUR' });
    });

    it('measures and the side-by-side answer too, asking for the price instead of a payback', async () => {
      const measures = (
        await t.http
          .post(`/api/houses/${houseId}/measures`)
          .set(bearer(owner))
          .send({ ...SEASON, measures: [{ kind: 'night-setpoint-lower', costAmount: 100 }] })
          .expect(200)
      ).body;
      expect(measures.baseline.cost).toBeNull();
      expect(measures.measures[0]).toMatchObject({
        yearlyMoneySaved: null,
        paybackStatus: 'enter-price',
        paybackText: 'enter the fuel price',
      });
      const sideBySide = (
        await t.http.post(`/api/houses/${houseId}/side-by-side`).set(bearer(owner)).send(SEASON).expect(200)
      ).body;
      expect(sideBySide.columns[0].season.total.cost).toBeNull();
      expect(sideBySide.seasonInputsUsed.currency).toBe('EUR');
    });

    it('the night demand answers with heat and no cost', async () => {
      const night = (
        await t.http
          .post(`/api/houses/${houseId}/night-demand`)
          .set(bearer(owner))
          .send({ date: '2027-01-15' })
          .expect(200)
      ).body;
      expect(night.energyKWh).toBeGreaterThan(0);
      expect(night.cost).toBeNull();
    });

    it('the budget gives heat and fuel per house, no cost, and a plain reason (200)', async () => {
      const budget = (
        await t.http.post(`/api/farms/${farmId}/season-budget`).set(bearer(owner)).send(SEASON).expect(200)
      ).body;
      expect(budget.currency).toBe('EUR');
      expect(budget.costComplete).toBe(false);
      expect(budget.houses[0].energyKWh).toBeGreaterThan(0);
      expect(budget.houses[0].cost).toBeNull();
      expect(budget.houses[0].problem).toMatch(/^No price for Propane.* yet: enter it to include this house's cost$/);
      const csv = await t.http
        .get(`/api/farms/${farmId}/season-budget.csv`)
        .query({ units: 'us', ...SEASON })
        .set(bearer(owner))
        .expect(200);
      const lines = parse(csv.text, { bom: true }) as string[][];
      expect(lines[0][lines[0].length - 1]).toBe('Cost (EUR)');
      // no price, no amount: every cost cell is empty (never a misleading 0.00)
      expect(lines.slice(1).every((line) => line[line.length - 1] === '')).toBe(true);
      expect(budget.totalCost).toBeNull();
    });

    it('once the price is saved (first save of the set), the cost follows in the farm currency', async () => {
      const version = await versionOf(t, owner, `/api/farms/${farmId}/fuel-prices`);
      await t.http
        .put(`/api/farms/${farmId}/fuel-prices`)
        .set(bearer(owner))
        .set(ifMatch(version))
        .send({ prices: [{ fuelId: 'propane', pricePerUnit: 1.25, priceUnit: 'us' }] })
        .expect(200);
      const season = (await t.http.post(`/api/houses/${houseId}/season`).set(bearer(owner)).send(SEASON).expect(200))
        .body;
      expect(season.total.cost).toBeCloseTo(season.total.fuelQuantityUs * 1.25, 6);
      const csv = await t.http
        .get(`/api/farms/${farmId}/season-budget.csv`)
        .query({ units: 'us', ...SEASON })
        .set(bearer(owner))
        .expect(200);
      const lines = parse(csv.text, { bom: true }) as string[][];
      const total = lines[lines.length - 1];
      // plain numbers for spreadsheets: two decimals (the euro's minor unit), no symbol
      expect(total[total.length - 1]).toMatch(/^\d+\.\d{2}$/);
      expect(Number(total[total.length - 1])).toBeCloseTo(season.total.cost, 2);
    });
  });

  describe('climate proposal from the farm log', () => {
    const upload = async (name: string, days: number) =>
      (
        await t.http
          .post(`/api/farms/${farmId}/temperature-logs`)
          .set(bearer(owner))
          .field('name', name)
          .field('mapping', JSON.stringify(HOURLY_MAPPING))
          .attach('file', Buffer.from(hourlyCsv('2025-01-01', days, 5)), {
            filename: 'log.csv',
            contentType: 'text/csv',
          })
          .expect(201)
      ).body.id as number;

    it('refuses a log shorter than a year, saying why (422)', async () => {
      const logId = await upload('Autumn only', 90);
      const refused = await t.http
        .get(`/api/farms/${farmId}/temperature-logs/${logId}/climate-proposal`)
        .set(bearer(owner))
        .expect(422);
      expect(refused.body.message).toMatch(/a whole year of hours/);
      expect(refused.body.message).toMatch(/about 90 days/);
    });

    it("proposes the design temperatures and monthly normals of a year's log, beside the current climate", async () => {
      // hourlyCsv: 5 − 5·cos(2π(h − 3)/24) every day: 0.0 °C at 03:00, 10.0 °C at 15:00
      const logId = await upload('Year 2025', 365);
      const proposal = (
        await t.http
          .get(`/api/farms/${farmId}/temperature-logs/${logId}/climate-proposal`)
          .set(bearer(owner))
          .expect(200)
      ).body;
      // 365 readings of 0.0 °C are the coldest hours, more than the 35 (0.4 %) and 87 (1 %) below the design values
      expect(proposal.winterDesign996C).toBe(0);
      expect(proposal.winterDesign99C).toBe(0);
      expect(proposal.summerDesign1C).toBe(10);
      expect(proposal.hoursUsed).toBe(8760);
      expect(proposal.monthly).toHaveLength(12);
      for (const month of proposal.monthly) {
        expect(month.meanDailyMinC).toBeCloseTo(0, 6);
        expect(month.meanDailyMaxC).toBeCloseTo(10, 6);
      }
      expect(proposal.currentClimate).not.toBeNull();
      expect(proposal.proposedClimate.summerDesignWetBulbC).toBe(proposal.currentClimate.summerDesignWetBulbC);
      const other = await t.http.get('/api/farms').set(bearer(owner)).expect(200);
      const demoFarmId = other.body.find((farm: { id: number }) => farm.id !== farmId).id as number;
      await t.http
        .get(`/api/farms/${demoFarmId}/temperature-logs/${logId}/climate-proposal`)
        .set(bearer(owner))
        .expect(404);
    });
  });
});
