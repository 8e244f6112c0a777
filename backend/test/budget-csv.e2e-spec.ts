import { parse } from 'csv-parse/sync';
import { DEMO_CLIMATE } from '../src/seed/demo-scenario';
import { GABLE_HOUSE_SPEC } from './fixtures';
import { bearer, createTestApp, type TestApp, ifMatch } from './test-app';

/**
 * The season-budget CSV read back with a real CSV parser (csv-parse), on a farm of its own:
 * awkward house names, a fuel without a price, US units.
 */
const SEASON = { startDate: '2026-12-01', endDate: '2027-02-28' };
const PRICED_NAME = 'North house, "the big one"';
const UNPRICED_NAME = 'Gas house';
/** names a spreadsheet would otherwise read as formulas */
const FORMULA_NAMES = ['=HYPERLINK("http://example.invalid","x")', '+1+2', '-3+4', '@SUM(1,2)'];

describe('season budget CSV (e2e)', () => {
  let t: TestApp;
  let token: string;
  let farmId: number;

  /** the raw bytes of a CSV download */
  const download = async (query: Record<string, string>): Promise<Buffer> => {
    const res = await t.http
      .get(`/api/farms/${farmId}/season-budget.csv`)
      .query({ ...SEASON, ...query })
      .set(bearer(token))
      .buffer(true)
      .parse((response, done) => {
        const chunks: Buffer[] = [];
        response.on('data', (chunk: Buffer) => chunks.push(chunk));
        response.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    return res.body as Buffer;
  };
  const rowsOf = (bytes: Buffer): string[][] => parse(bytes, { bom: true, relax_column_count: false });

  beforeAll(async () => {
    t = await createTestApp();
    token = (
      await t.http
        .post('/api/auth/register')
        .send({ email: 'csv@example.org', password: 'member-pass-8472', name: 'CSV grower' })
        .expect(201)
    ).body.accessToken;
    farmId = (
      await t.http
        .post('/api/farms')
        .set(bearer(token))
        .send({ name: 'CSV farm', latitudeDeg: 45, longitudeDeg: -94, elevationM: 300, timeZone: 'America/Chicago' })
        .expect(201)
    ).body.id;
    const { sourceNote: _note, ...climate } = DEMO_CLIMATE as typeof DEMO_CLIMATE & { sourceNote?: string };
    const versionOf = async (path: string) =>
      (await t.http.get(path).set(bearer(token)).expect(200)).body.version as number;
    await t.http
      .put(`/api/farms/${farmId}/climate`)
      .set(bearer(token))
      .set(ifMatch(await versionOf(`/api/farms/${farmId}/climate`)))
      .send({ ...climate, sourceNote: 'Invented test climate' })
      .expect(200);
    // only propane has a price; natural gas has none
    await t.http
      .put(`/api/farms/${farmId}/fuel-prices`)
      .set(bearer(token))
      .set(ifMatch(await versionOf(`/api/farms/${farmId}/fuel-prices`)))
      .send({ prices: [{ fuelId: 'propane', pricePerUnit: 2, priceUnit: 'us', note: 'invented test price' }] })
      .expect(200);
    const addHouse = (name: string, fuelId: string) =>
      t.http
        .post(`/api/farms/${farmId}/houses`)
        .set(bearer(token))
        .send({
          name,
          ...GABLE_HOUSE_SPEC,
          heaters: [{ count: 2, ratedInputW: 50_000, efficiency: 0.8, fuelId }],
        })
        .expect(201);
    await addHouse(PRICED_NAME, 'propane');
    await addHouse(UNPRICED_NAME, 'natural-gas');
    for (const name of FORMULA_NAMES) await addHouse(name, 'propane');
  });
  afterAll(() => t.close());

  it('quotes a house name holding a comma and double quotes, and the parser gets the name back exactly', async () => {
    const bytes = await download({ units: 'us' });
    expect(bytes.toString('utf8')).toContain('"North house, ""the big one"""');
    const rows = rowsOf(bytes);
    const width = rows[0].length;
    for (const row of rows) expect(row).toHaveLength(width);
    expect(rows.filter((row) => row[0] === PRICED_NAME)).toHaveLength(3 + 1); // three months and a total
  });

  it('US units: heat in MMBtu, propane in US gal and natural gas in therm, numbers that agree with the JSON budget', async () => {
    const budget = (await t.http.post(`/api/farms/${farmId}/season-budget`).set(bearer(token)).send(SEASON).expect(200))
      .body;
    const rows = rowsOf(await download({ units: 'us' }));
    const header = rows[0];
    expect(header.slice(0, 6)).toEqual([
      'House',
      'Year',
      'Month',
      'Fuel',
      'Heat delivered (MMBtu)',
      'Fuel burnt (MMBtu)',
    ]);
    const propaneColumn = header.findIndex((cell) => cell.endsWith('(US gal)'));
    const gasColumn = header.findIndex((cell) => cell.endsWith('(therm)'));
    expect(propaneColumn).toBeGreaterThan(5);
    expect(gasColumn).toBeGreaterThan(5);
    expect(header[header.length - 1]).toBe('Cost (USD)');

    const pricedTotal = rows.find((row) => row[0] === PRICED_NAME && row[2] === 'season total')!;
    const pricedHouse = budget.houses.find((house: { name: string }) => house.name === PRICED_NAME);
    // 1 MMBtu = 10⁶ Btu × 1055.056 J/Btu ÷ 3.6 × 10⁶ J/kWh = 293.071 kWh (hand arithmetic)
    expect(Math.abs(Number(pricedTotal[4]) - pricedHouse.energyKWh / 293.0711)).toBeLessThanOrEqual(0.0005);
    expect(Number(pricedTotal[propaneColumn])).toBeCloseTo(pricedHouse.fuelQuantityUs, 1);
    expect(pricedTotal[gasColumn]).toBe('');
    // cost = US gal × the farm's $2 per US gal, to the cent
    expect(Number(pricedTotal[pricedTotal.length - 1])).toBeCloseTo(pricedHouse.fuelQuantityUs * 2, 1);
  });

  it('leaves every cost cell of a house whose fuel has no price blank, but still shows its fuel quantity', async () => {
    const rows = rowsOf(await download({ units: 'us' }));
    const gasColumn = rows[0].findIndex((cell) => cell.endsWith('(therm)'));
    const gasRows = rows.filter((row) => row[0] === UNPRICED_NAME);
    expect(gasRows).toHaveLength(3 + 1);
    for (const row of gasRows) {
      expect(row[row.length - 1]).toBe('');
      expect(Number(row[gasColumn])).toBeGreaterThan(0);
    }
    // the priced houses keep their cost
    const priced = rows.find((row) => row[0] === PRICED_NAME && row[2] === 'season total')!;
    expect(Number(priced[priced.length - 1])).toBeGreaterThan(0);
  });

  it('SI units: kWh, L of propane and m³ of natural gas', async () => {
    const header = rowsOf(await download({ units: 'si' }))[0];
    expect(header).toContain('Heat delivered (kWh)');
    expect(header.some((cell) => cell.endsWith('(L)'))).toBe(true);
    expect(header.some((cell) => cell.endsWith('(m³)'))).toBe(true);
  });

  it('never lets a spreadsheet read a house name as a formula: no cell starts with = + - @, tab or CR, and the name stays readable', async () => {
    const rows = rowsOf(await download({ units: 'us' }));
    const nameCells = rows.slice(1).map((row) => row[0]);
    for (const name of FORMULA_NAMES) {
      const cells = nameCells.filter((cell) => cell.replace(/^'/, '') === name);
      expect(cells).toHaveLength(3 + 1);
      for (const cell of cells) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
    }
    // numbers, negative ones included, are left as numbers
    for (const row of rows.slice(1)) {
      for (const cell of row.slice(4)) if (cell !== '') expect(Number.isFinite(Number(cell))).toBe(true);
    }
  });

  // The export is to open in a spreadsheet with its units (°, ³) intact: it starts with a UTF-8
  // byte-order mark.
  it('starts with a UTF-8 byte-order mark so that a spreadsheet reads m³ and °C correctly', async () => {
    const bytes = await download({ units: 'si' });
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
  });
});
