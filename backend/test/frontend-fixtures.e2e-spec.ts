import { resolve } from 'node:path';
import { bearer, createTestApp, signIn, type TestApp } from './test-app';

/**
 * The frontend's component tests run on API results captured once
 * (frontend/src/test/estimate-fixtures.ts). This spec asks the API for the same results on the
 * freshly seeded demo farm and fails when the captured copies no longer match, so that the
 * component tests cannot drift away from what the API returns. To refresh them, copy the API's
 * answers into that file (the assumption lists there may be shortened, and long sources cut).
 */
type Json = unknown;

// Loaded at run time (ts-jest compiles it): the backend's type-check stays within the backend.
const FIXTURES = resolve(__dirname, '..', '..', 'frontend', 'src', 'test', 'estimate-fixtures.ts');
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { demoHouseB, demoHouseBCooling, demoHouseBHeating } = require(FIXTURES) as Record<
  'demoHouseB' | 'demoHouseBCooling' | 'demoHouseBHeating',
  Record<string, Json> & { name: string }
>;

/** Differences between a captured fixture and the live answer; floats compared with a relative tolerance. */
function differences(fixture: Json, live: Json, path = '$'): string[] {
  if (typeof fixture === 'number' && typeof live === 'number') {
    const scale = Math.max(Math.abs(fixture), Math.abs(live));
    return Math.abs(fixture - live) <= 1e-9 * scale + 1e-12 ? [] : [`${path}: captured ${fixture}, API ${live}`];
  }
  if (Array.isArray(fixture)) {
    if (!Array.isArray(live)) return [`${path}: captured an array, API ${JSON.stringify(live)}`];
    if (path.endsWith('.assumptions')) {
      // the captured list is a shortened one: each captured assumption must be in the live list
      return fixture.flatMap((item, index) => {
        const key = (item as { key: string }).key;
        const match = live.find((candidate) => (candidate as { key: string }).key === key);
        return match === undefined
          ? [`${path}[${index}]: assumption ${key} is not in the API's answer`]
          : differences(item, match, `${path}[${key}]`);
      });
    }
    if (fixture.length !== live.length) return [`${path}: captured ${fixture.length} items, API ${live.length}`];
    return fixture.flatMap((item, index) => differences(item, live[index], `${path}[${index}]`));
  }
  if (fixture !== null && typeof fixture === 'object') {
    if (live === null || typeof live !== 'object') return [`${path}: captured an object, API ${JSON.stringify(live)}`];
    const keys = new Set([...Object.keys(fixture), ...Object.keys(live)]);
    return [...keys].flatMap((key) => {
      const inFixture = key in fixture;
      const inLive = key in (live as object);
      if (!inFixture) return [`${path}.${key}: in the API's answer but not captured`];
      if (!inLive) return [`${path}.${key}: captured but not in the API's answer`];
      return differences((fixture as Record<string, Json>)[key], (live as Record<string, Json>)[key], `${path}.${key}`);
    });
  }
  if (typeof fixture === 'string' && typeof live === 'string' && path.endsWith('.source')) {
    // long sources are cut in the captured copy
    return live.startsWith(fixture) ? [] : [`${path}: captured "${fixture}", API "${live}"`];
  }
  return fixture === live ? [] : [`${path}: captured ${JSON.stringify(fixture)}, API ${JSON.stringify(live)}`];
}

describe('the frontend’s captured estimate fixtures still match the API (e2e)', () => {
  let t: TestApp;
  let token: string;
  let houseId: number;

  beforeAll(async () => {
    t = await createTestApp();
    token = await signIn(t, 'grower@example.com');
    const farms = (await t.http.get('/api/farms').set(bearer(token)).expect(200)).body;
    const houses = (await t.http.get(`/api/farms/${farms[0].id}/houses`).set(bearer(token)).expect(200)).body;
    houseId = houses.find((house: { name: string }) => house.name === demoHouseB.name).id;
  });
  afterAll(() => t.close());

  it('the comparison itself notices a changed number, a missing key and a missing assumption', () => {
    expect(differences({ a: 1 }, { a: 1 + 1e-12 })).toEqual([]);
    expect(differences({ a: 1 }, { a: 1.001 })).toHaveLength(1);
    expect(differences({ a: 1, b: 2 }, { a: 1 })).toHaveLength(1);
    expect(differences({ assumptions: [{ key: 'x', value: 1 }] }, { assumptions: [{ key: 'y', value: 1 }] })).toEqual([
      "$.assumptions[0]: assumption x is not in the API's answer",
    ]);
  });

  it('demo House B as stored', async () => {
    const live = (await t.http.get(`/api/houses/${houseId}`).set(bearer(token)).expect(200)).body;
    const { id: _id, farmId: _farmId, createdAt: _c, updatedAt: _u, ...captured } = demoHouseB;
    const { id: _liveId, farmId: _liveFarm, createdAt: _lc, updatedAt: _lu, ...current } = live;
    expect(differences(captured, current)).toEqual([]);
  });

  it('its design-night heating estimate', async () => {
    const live = (await t.http.post(`/api/houses/${houseId}/estimate`).set(bearer(token)).send({}).expect(200)).body;
    expect(differences(demoHouseBHeating, live)).toEqual([]);
  });

  it('its cooling estimate', async () => {
    const live = (await t.http.post(`/api/houses/${houseId}/cooling`).set(bearer(token)).send({}).expect(200)).body;
    expect(differences(demoHouseBCooling, live)).toEqual([]);
  });
});
