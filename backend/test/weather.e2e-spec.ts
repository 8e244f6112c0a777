import type { WeatherService } from '../src/weather/weather.service';
import { bearer, createTestApp, ifMatch, signIn, type TestApp } from './test-app';

/**
 * Weather history through the local stand-in (invented weather, same request and answer format as
 * the hourly weather-history service): fetching, caching, the climate proposal, and the faults.
 */
describe('weather history and the climate proposal (e2e)', () => {
  let t: TestApp;
  let owner: string;
  let farmId: number;
  let weather: WeatherService;
  const lastYear = new Date().getUTCFullYear() - 1;

  beforeAll(async () => {
    t = await createTestApp({ WEATHER_ATTEMPTS: '2', WEATHER_TIMEOUT_MS: '4000' });
    owner = await signIn(t, 'owner@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(owner)).expect(200)).body[0].id;
    const { WeatherService } = await import('../src/weather/weather.service');
    weather = t.app.get(WeatherService);
  });
  afterAll(() => t.close());

  const standIn = () => weather.localStandIn!;
  const proposal = (fromYear: number, toYear: number) =>
    t.http.get(`/api/farms/${farmId}/weather/climate-proposal`).query({ fromYear, toYear }).set(bearer(owner));
  const climateNow = async () =>
    (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(owner)).expect(200)).body.climate;

  it('says plainly that the weather is invented by the local stand-in, and offers the last 10 complete years', async () => {
    const res = await t.http.get(`/api/farms/${farmId}/weather`).set(bearer(owner)).expect(200);
    expect(res.body).toMatchObject({
      standIn: true,
      serviceUrl: null,
      defaultFromYear: lastYear - 9,
      defaultToYear: lastYear,
      lastCompleteYear: lastYear,
    });
    expect(res.body.note).toMatch(/INVENTED/);
    expect(res.body.note).toMatch(/WEATHER_API_URL/);
  });

  it('fetches a year once and serves the second request from the cache without calling the service', async () => {
    const before = standIn().requestCount;
    const first = await t.http.post(`/api/farms/${farmId}/weather/years/${lastYear}`).set(bearer(owner)).expect(201);
    expect(first.body).toMatchObject({ year: lastYear, fromCache: false, missingHourCount: 0 });
    expect([8760, 8784]).toContain(first.body.hourCount);
    expect(standIn().requestCount).toBe(before + 1);
    const second = await t.http.post(`/api/farms/${farmId}/weather/years/${lastYear}`).set(bearer(owner)).expect(201);
    expect(second.body.fromCache).toBe(true);
    expect(standIn().requestCount).toBe(before + 1);
  });

  it('proposes design temperatures and monthly normals that the climate route accepts as they are', async () => {
    const res = await proposal(lastYear - 1, lastYear).expect(200);
    const p = res.body;
    expect(p.yearsUsed.map((y: { year: number }) => y.year)).toEqual([lastYear - 1, lastYear]);
    expect(p.yearsLeftOut).toEqual([]);
    // The definitions order the four design values; the demo farm is at about 45.5° N (cold winters).
    expect(p.winterDesign996C).toBeLessThanOrEqual(p.winterDesign99C);
    expect(p.winterDesign99C).toBeLessThan(p.summerDesign1C);
    expect(p.summerDesign1C).toBeLessThanOrEqual(p.summerDesign04C);
    expect(p.winterDesign996C).toBeGreaterThan(-45);
    expect(p.winterDesign996C).toBeLessThan(-15);
    expect(p.summerCoincidentWetBulb1C).toBeLessThan(p.summerDesign1C);
    expect(p.monthly).toHaveLength(12);
    expect(p.monthly[0].meanDailyMaxC).toBeLessThan(p.monthly[6].meanDailyMaxC);
    for (const month of p.monthly) {
      expect(month.meanDailyMinC).toBeLessThan(month.meanDailyMaxC);
      expect(month.clearness).toBeGreaterThan(0);
      expect(month.clearness).toBeLessThanOrEqual(1);
    }
    expect(p.proposedClimate.winterDesignC).toBe(p.winterDesign996C);
    expect(p.proposedClimate.summerDesignC).toBe(p.summerDesign1C);
    expect(p.proposedClimate.sourceNote).toMatch(/INVENTED/);
    // Nothing was saved by asking; saving is the user's PUT of what they confirm.
    const loaded = (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(owner)).expect(200)).body;
    const saved = await t.http
      .put(`/api/farms/${farmId}/climate`)
      .set(bearer(owner))
      .set(ifMatch(loaded.version))
      .send(p.proposedClimate)
      .expect(200);
    expect(saved.body.climate.winterDesignC).toBe(p.winterDesign996C);
  });

  it('answers the same request the same way (the stand-in is seeded by place and year)', async () => {
    const a = (await proposal(lastYear, lastYear).expect(200)).body;
    const b = (await proposal(lastYear, lastYear).expect(200)).body;
    expect(b.winterDesign996C).toBe(a.winterDesign996C);
  });

  it('leaves out and names a year with more than 10 % of its hours missing', async () => {
    standIn().controls.gapsByYear = { [lastYear - 3]: 0.12 };
    const res = await proposal(lastYear - 3, lastYear - 2).expect(200);
    standIn().controls.gapsByYear = {};
    expect(res.body.yearsUsed.map((y: { year: number }) => y.year)).toEqual([lastYear - 2]);
    expect(res.body.yearsLeftOut).toHaveLength(1);
    expect(res.body.yearsLeftOut[0]).toMatchObject({ year: lastYear - 3 });
    expect(res.body.yearsLeftOut[0].missingShare).toBeGreaterThan(0.1);
    expect(res.body.yearsLeftOut[0].reason).toMatch(/missing/);
  });

  it('a service answering 500 gives a clear message, stores nothing and leaves the climate untouched', async () => {
    const climate = await climateNow();
    const before = standIn().requestCount;
    standIn().controls.failNext = { status: 500, count: 2 };
    const res = await t.http
      .post(`/api/farms/${farmId}/weather/years/${lastYear - 5}`)
      .set(bearer(owner))
      .expect(502);
    expect(res.body).toMatchObject({ statusCode: 502, field: 'weather' });
    expect(res.body.message).toMatch(/weather service answered 500 \(2 attempts/);
    expect(standIn().requestCount).toBe(before + 2);
    expect(await climateNow()).toEqual(climate);
    // Nothing was cached from the failure: the next request asks the service again.
    const retry = await t.http
      .post(`/api/farms/${farmId}/weather/years/${lastYear - 5}`)
      .set(bearer(owner))
      .expect(201);
    expect(retry.body.fromCache).toBe(false);
  });

  it('retries once after a passing fault and then succeeds', async () => {
    standIn().controls.failNext = { status: 503, count: 1 };
    const res = await t.http
      .post(`/api/farms/${farmId}/weather/years/${lastYear - 6}`)
      .set(bearer(owner))
      .expect(201);
    expect(res.body.fromCache).toBe(false);
  });

  it('a service that does not answer in time gives 504 with a clear message', async () => {
    standIn().controls.delayNext = { ms: 5000, count: 2 };
    const res = await t.http
      .post(`/api/farms/${farmId}/weather/years/${lastYear - 7}`)
      .set(bearer(owner))
      .expect(504);
    expect(res.body.message).toMatch(/did not answer within 4 s/);
  });

  it('an answer that is not hourly weather gives a clear message', async () => {
    standIn().controls.garbageNext = 2;
    const res = await t.http
      .post(`/api/farms/${farmId}/weather/years/${lastYear - 8}`)
      .set(bearer(owner))
      .expect(502);
    expect(res.body.message).toMatch(/not hourly weather/);
  });

  it('keeps a year as a temperature log in local standard time, and a season runs on its hours', async () => {
    const grower = await signIn(t, 'grower@example.com');
    const res = await t.http
      .post(`/api/farms/${farmId}/weather/years/${lastYear}/temperature-log`)
      .set(bearer(grower))
      .expect(201);
    expect(res.body.name).toMatch(/INVENTED/);
    expect(res.body.resolution).toBe('hourly');
    // The demo farm keeps Central Standard Time (UTC−6): the year's first UTC hour is 18:00 on 31 December.
    expect(res.body.startDate).toBe(`${lastYear - 1}-12-31`);
    expect(res.body.endDate).toBe(`${lastYear}-12-31`);
    const houseId = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(grower)).expect(200)).body[0].id;
    const season = await t.http
      .post(`/api/houses/${houseId}/season`)
      .set(bearer(grower))
      .send({ climateSource: { temperatureLogId: res.body.id } })
      .expect(200);
    expect(season.body.inputsUsed.climateSource).toBe('temperature-log');
    expect(season.body.total.energyKWh).toBeGreaterThan(0);
  });

  it('refuses years the service cannot have, naming the field', async () => {
    const future = await proposal(lastYear, lastYear + 1).expect(400);
    expect(future.body.field).toBe('toYear');
    const early = await t.http.post(`/api/farms/${farmId}/weather/years/1939`).set(bearer(owner)).expect(400);
    expect(early.body.statusCode).toBe(400);
    const tooMany = await proposal(lastYear - 40, lastYear).expect(400);
    expect(tooMany.body.message).toMatch(/at most 30 years/);
  });
});
