import { TEMPERATURE_LOG_MAX_BYTES } from '../src/temperature-logs/csv/temperature-log-csv';
import { dailyMinMaxCsv, hourlyCsv, HOURLY_MAPPING } from './temperature-csv';
import { bearer, createTestApp, signIn, type TestApp } from './test-app';

interface Problem {
  field: string;
  message: string;
}

describe('temperature logs (e2e)', () => {
  let t: TestApp;
  let grower: string;
  let adviser: string;
  let farmId: number;

  beforeAll(async () => {
    t = await createTestApp();
    grower = await signIn(t, 'grower@example.com');
    adviser = await signIn(t, 'adviser@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body[0].id;
  });
  afterAll(() => t.close());

  const listCount = async () =>
    (await t.http.get(`/api/farms/${farmId}/temperature-logs`).set(bearer(grower)).expect(200)).body.length as number;
  const upload = (csv: string | Buffer, mapping: object | string, name = 'Test log') =>
    t.http
      .post(`/api/farms/${farmId}/temperature-logs`)
      .set(bearer(grower))
      .field('name', name)
      .field('mapping', typeof mapping === 'string' ? mapping : JSON.stringify(mapping))
      .attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv, 'utf8'), {
        filename: 'log.csv',
        contentType: 'text/csv',
      });
  const inspect = (csv: string | Buffer) =>
    t.http
      .post(`/api/farms/${farmId}/temperature-logs/inspect`)
      .set(bearer(grower))
      .attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv, 'utf8'), {
        filename: 'log.csv',
        contentType: 'text/csv',
      });

  it('inspects an hourly file and proposes its columns without storing anything', async () => {
    const before = await listCount();
    const res = await inspect(hourlyCsv('2027-01-01', 3)).expect(200);
    expect(res.body.delimiter).toBe(',');
    expect(res.body.hasHeader).toBe(true);
    expect(res.body.headers).toEqual(['Time', 'Outdoor temp (°C)', 'RH (%)']);
    expect(res.body.sampleRows[0]).toEqual(['2027-01-01 00:00', '-13.5', '80']); // −10 − 5·cos(−π/4)
    expect(res.body.dataRowCount).toBe(72);
    expect(res.body.proposal).toMatchObject({
      timestampColumn: 'Time',
      temperatureColumn: 'Outdoor temp (°C)',
      unit: 'C',
      resolution: 'hourly',
    });
    expect(await listCount()).toBe(before);
  });

  it('stores an hourly log read with the confirmed mapping and shows it day by day', async () => {
    const res = await upload(hourlyCsv('2027-01-01', 14), HOURLY_MAPPING, 'North station, January').expect(201);
    expect(res.body).toMatchObject({
      name: 'North station, January',
      resolution: 'hourly',
      startDate: '2027-01-01',
      endDate: '2027-01-14',
      rowCount: 336,
      readingCount: 336,
    });
    const list = (await t.http.get(`/api/farms/${farmId}/temperature-logs`).set(bearer(adviser)).expect(200)).body;
    expect(list.map((log: { id: number }) => log.id)).toContain(res.body.id);
    expect(list[0]).not.toHaveProperty('readings');

    const detail = (await t.http.get(`/api/temperature-logs/${res.body.id}`).set(bearer(adviser)).expect(200)).body;
    expect(detail.mapping).toMatchObject(HOURLY_MAPPING);
    expect(detail.days).toHaveLength(14);
    for (const day of detail.days) {
      expect(day.readingCount).toBe(24);
      expect(day.minC).toBeLessThanOrEqual(day.meanC);
      expect(day.meanC).toBeLessThanOrEqual(day.maxC);
    }
    // the written curve: −10 ± 5 °C, coldest at 03:00, warmest at 15:00
    expect(detail.days[0].minC).toBeCloseTo(-15, 5);
    expect(detail.days[0].maxC).toBeCloseTo(-5, 5);
    expect(detail.days[0].meanC).toBeCloseTo(-10, 1);
  });

  it('stores a daily min/max log with semicolons, day-first dates and decimal commas', async () => {
    const csv = dailyMinMaxCsv('2027-01-01', 31);
    const proposal = (await inspect(csv).expect(200)).body.proposal;
    expect(proposal).toMatchObject({
      timestampColumn: 'Datum',
      minColumn: 'Min °C',
      maxColumn: 'Max °C',
      resolution: 'daily',
      dateOrder: 'DMY',
      decimalComma: true,
    });
    const { unitReason: _reason, dateOrderAmbiguous: _ambiguous, ...mapping } = proposal;
    const res = await upload(csv, mapping, 'Daily extremes').expect(201);
    expect(res.body).toMatchObject({
      resolution: 'daily',
      startDate: '2027-01-01',
      endDate: '2027-01-31',
      rowCount: 31,
    });
    const detail = (await t.http.get(`/api/temperature-logs/${res.body.id}`).set(bearer(grower)).expect(200)).body;
    expect(detail.days[0]).toMatchObject({ date: '2027-01-01', minC: -15, maxC: -6.5, readingCount: 1 });
    expect(detail.days[0].meanC).toBeCloseTo(-10.75, 5);
  });

  it('refuses malformed rows with 422, one entry per line, and stores nothing', async () => {
    const before = await listCount();
    const lines = hourlyCsv('2027-01-01', 1).split('\n');
    lines[3] = '2027-01-01 02:00,abc,80'; // line 4 of the file
    lines[6] = '2027-13-01 05:00,-9.0,80'; // line 7
    const res = await upload(lines.join('\n'), HOURLY_MAPPING).expect(422);
    expect(res.body.statusCode).toBe(422);
    expect(res.body.field).toBe('file');
    const byLine = Object.fromEntries((res.body.details as Problem[]).map((d) => [d.field, d.message]));
    expect(byLine['line 4']).toMatch(/'abc' is not a number/);
    expect(byLine['line 7']).toMatch(/not a date/);
    expect(await listCount()).toBe(before);
  });

  it('names a mapped column the file does not have', async () => {
    const res = await upload(hourlyCsv('2027-01-01', 1), { ...HOURLY_MAPPING, temperatureColumn: 'Outside' }).expect(
      422,
    );
    expect(res.body.details[0].field).toBe('line 1');
    expect(res.body.details[0].message).toMatch(/'Outside' is not in the file/);
  });

  it('refuses an empty file and a one-column file', async () => {
    const empty = await upload('', HOURLY_MAPPING).expect(422);
    expect(empty.body.message).toMatch(/empty/);
    const single = await inspect('just one column\n1\n2\n').expect(422);
    expect(single.body.message).toMatch(/only one column/);
  });

  it('refuses a file that is not UTF-8 (Latin-1 é) with a clear 422', async () => {
    const latin1 = Buffer.concat([
      Buffer.from('Time,Temp', 'ascii'),
      Buffer.from([0xe9]),
      Buffer.from('rature\n2027-01-01 00:00,-5.0\n', 'ascii'),
    ]);
    const res = await inspect(latin1).expect(422);
    expect(res.body.message).toMatch(/not UTF-8/);
    expect(res.body.details[0]).toMatchObject({ field: 'line 1' });
    expect((await upload(latin1, HOURLY_MAPPING).expect(422)).body.message).toMatch(/UTF-8/);
  });

  it(`answers 413 for a file over ${TEMPERATURE_LOG_MAX_BYTES / 1024 / 1024} MB and stores nothing`, async () => {
    const before = await listCount();
    const big = Buffer.alloc(TEMPERATURE_LOG_MAX_BYTES + 1, 'a');
    const res = await upload(big, HOURLY_MAPPING).expect(413);
    expect(res.body).toMatchObject({ statusCode: 413, error: 'Payload Too Large' });
    expect(res.body.message).toMatch(/larger than 5 MB/);
    expect(await listCount()).toBe(before);
  });

  it('accepts a valid file of 124,000 hourly rows (read in a worker thread) and lists 20 bad lines once each', async () => {
    const csv = hourlyCsv('2000-01-01', 124_000 / 24, 5);
    expect(Buffer.byteLength(csv)).toBeLessThan(TEMPERATURE_LOG_MAX_BYTES);
    const inspected = await inspect(csv).expect(200);
    expect(inspected.body.dataRowCount).toBe(124_000);
    const stored = await upload(csv, HOURLY_MAPPING, 'Fourteen years').expect(201);
    expect(stored.body).toMatchObject({ rowCount: 124_000, readingCount: 124_000, startDate: '2000-01-01' });

    // 30 bad lines, each with a bad temperature: the first 20 are listed, once each, the rest counted.
    const lines = hourlyCsv('2001-01-01', 2).split('\n');
    for (let index = 1; index <= 30; index++) lines[index] = lines[index].replace(/,-?[\d.]+,/, ',warm,');
    const refused = await upload(lines.join('\n'), HOURLY_MAPPING).expect(422);
    const listed = (refused.body.details as Problem[]).filter((d) => d.field.startsWith('line '));
    expect(listed.map((d) => d.field)).toEqual(Array.from({ length: 20 }, (_, index) => `line ${index + 2}`));
    expect(refused.body.details.at(-1)).toEqual({ field: 'file', message: '10 more bad lines not listed' });
  });

  it('asks for the file part and a JSON mapping (400 naming the field)', async () => {
    const noFile = await t.http.post(`/api/farms/${farmId}/temperature-logs/inspect`).set(bearer(grower)).expect(400);
    expect(noFile.body.field).toBe('file');
    const badJson = await upload(hourlyCsv('2027-01-01', 1), '{not json').expect(400);
    expect(badJson.body.field).toBe('mapping');
    const badUnit = await upload(hourlyCsv('2027-01-01', 1), { ...HOURLY_MAPPING, unit: 'K' }).expect(400);
    expect(badUnit.body.details.map((d: Problem) => d.field)).toContain('mapping.unit');
  });

  it('lets a grower delete a log; then it is gone', async () => {
    const created = (await upload(hourlyCsv('2027-02-01', 1), HOURLY_MAPPING, 'To delete').expect(201)).body;
    await t.http.delete(`/api/temperature-logs/${created.id}`).set(bearer(adviser)).expect(403);
    await t.http.delete(`/api/temperature-logs/${created.id}`).set(bearer(grower)).expect(204);
    await t.http.get(`/api/temperature-logs/${created.id}`).set(bearer(grower)).expect(404);
  });
});
