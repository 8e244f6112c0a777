import { Sequelize } from 'sequelize-typescript';
import { QueryTypes } from 'sequelize';
import { DEMO_CLIMATE } from '../src/seed/demo-scenario';
import { houseBody } from './fixtures';
import { hourlyCsv, HOURLY_MAPPING } from './temperature-csv';
import { bearer, createTestApp, joinByInvitation, signIn, type TestApp, ifMatch, versionOf } from './test-app';

/**
 * Deleting a farm deletes everything that belongs to it: houses and their production calendars,
 * temperature logs, the climate, fuel prices and memberships. Checked in the database itself,
 * since the API answers 404 for all of it once the farm is gone; the demo farm is left alone.
 */
describe('deleting a farm (e2e)', () => {
  let t: TestApp;
  let owner: string;

  beforeAll(async () => {
    t = await createTestApp();
    owner = await signIn(t, 'owner@example.com');
  });
  afterAll(() => t.close());

  const countRows = async (table: string, column: string, id: number): Promise<number> => {
    const sequelize = t.app.get(Sequelize);
    const [row] = await sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM ${table} WHERE "${column}" = :id`, {
      replacements: { id },
      type: QueryTypes.SELECT,
    });
    return Number(row.n);
  };

  /** A farm with one of everything, returning its id and its house's id. */
  const fullFarm = async (name: string) => {
    const farmId = (
      await t.http
        .post('/api/farms')
        .set(bearer(owner))
        .send({ name, latitudeDeg: 45, longitudeDeg: -94, elevationM: 300, timeZone: 'America/Chicago' })
        .expect(201)
    ).body.id as number;
    await joinByInvitation(t, owner, farmId, 'grower@example.com', 'grower', await signIn(t, 'grower@example.com'));
    const houseId = (
      await t.http.post(`/api/farms/${farmId}/houses`).set(bearer(owner)).send(houseBody('Doomed house')).expect(201)
    ).body.id as number;
    await t.http
      .put(`/api/houses/${houseId}/calendar`)
      .set(bearer(owner))
      .set(ifMatch(await versionOf(t, owner, `/api/houses/${houseId}/calendar`)))
      .send({ periods: [{ startMonthDay: '10-01', endMonthDay: '04-30', mode: 'heated', label: 'Winter' }] })
      .expect(200);
    await t.http
      .put(`/api/farms/${farmId}/climate`)
      .set(bearer(owner))
      .set(ifMatch(await versionOf(t, owner, `/api/farms/${farmId}/climate`)))
      .send(DEMO_CLIMATE)
      .expect(200);
    await t.http
      .put(`/api/farms/${farmId}/fuel-prices`)
      .set(bearer(owner))
      .set(ifMatch(await versionOf(t, owner, `/api/farms/${farmId}/fuel-prices`)))
      .send({ prices: [{ fuelId: 'propane', pricePerUnit: 2, priceUnit: 'us', note: 'invented test price' }] })
      .expect(200);
    await t.http
      .post(`/api/farms/${farmId}/temperature-logs`)
      .set(bearer(owner))
      .field('name', 'January log')
      .field('mapping', JSON.stringify(HOURLY_MAPPING))
      .attach('file', Buffer.from(hourlyCsv('2027-01-01', 2)), { filename: 'log.csv', contentType: 'text/csv' })
      .expect(201);
    return { farmId, houseId };
  };

  const everything = async (farmId: number, houseId: number) => ({
    houses: await countRows('houses', 'farmId', farmId),
    calendars: await countRows('house_calendars', 'houseId', houseId),
    logs: await countRows('temperature_logs', 'farmId', farmId),
    climate: await countRows('farm_climates', 'farmId', farmId),
    prices: await countRows('farm_fuel_prices', 'farmId', farmId),
    memberships: await countRows('memberships', 'farmId', farmId),
    farm: await countRows('farms', 'id', farmId),
  });

  it('removes its houses, calendars, temperature logs, climate, fuel prices and memberships', async () => {
    const { farmId, houseId } = await fullFarm('To be deleted');
    const kept = await fullFarm('To be kept');
    const before = await everything(farmId, houseId);
    expect(before).toEqual({
      houses: 1,
      calendars: expect.any(Number),
      logs: 1,
      climate: 1,
      prices: 1,
      memberships: 2,
      farm: 1,
    });
    expect(before.calendars).toBeGreaterThanOrEqual(1);

    await t.http.delete(`/api/farms/${farmId}`).set(bearer(owner)).expect(204);

    expect(await everything(farmId, houseId)).toEqual({
      houses: 0,
      calendars: 0,
      logs: 0,
      climate: 0,
      prices: 0,
      memberships: 0,
      farm: 0,
    });
    // the other farm keeps all of its own
    const other = await everything(kept.farmId, kept.houseId);
    expect(other).toMatchObject({ houses: 1, logs: 1, climate: 1, prices: 1, memberships: 2, farm: 1 });
    expect(other.calendars).toBeGreaterThanOrEqual(1);
    await t.http.get(`/api/farms/${farmId}`).set(bearer(owner)).expect(404);
    await t.http.get(`/api/houses/${houseId}/calendar`).set(bearer(owner)).expect(404);
  });
});
