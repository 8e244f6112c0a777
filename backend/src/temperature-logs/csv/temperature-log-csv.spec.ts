import {
  decodeTemperatureCsv,
  detectDelimiter,
  inspectTemperatureCsv,
  MAX_LISTED_ERRORS,
  TEMPERATURE_LOG_MAX_ROWS,
  parseTemperatureCsv,
  TEMPERATURE_LOG_MAX_BYTES,
  TemperatureLogError,
} from './temperature-log-csv';
import { EngineInputError } from '@thermbay/engine/errors';

function logError(run: () => unknown): TemperatureLogError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(TemperatureLogError);
    expect(error).toBeInstanceOf(EngineInputError);
    return error as TemperatureLogError;
  }
  throw new Error('expected a TemperatureLogError');
}

const HOURLY = [
  'Timestamp,Outdoor temp (°C),RH (%)',
  '2026-01-05 00:00,-3.5,80',
  '2026-01-05 01:00,-4.0,82',
  '2026-01-05 02:00,-4.6,85',
  '',
].join('\n');

describe('temperature log: inspection', () => {
  it('proposes the timestamp and temperature columns of an hourly comma file', () => {
    const inspection = inspectTemperatureCsv(HOURLY);
    expect(inspection.delimiter).toBe(',');
    expect(inspection.hasHeader).toBe(true);
    expect(inspection.headers).toEqual(['Timestamp', 'Outdoor temp (°C)', 'RH (%)']);
    expect(inspection.sampleRows[0]).toEqual(['2026-01-05 00:00', '-3.5', '80']);
    expect(inspection.dataRowCount).toBe(3);
    expect(inspection.proposal).toMatchObject({
      timestampColumn: 'Timestamp',
      temperatureColumn: 'Outdoor temp (°C)',
      unit: 'C',
      resolution: 'hourly',
    });
  });

  it('reads semicolon files with decimal commas, separate date and time columns and day-first dates', () => {
    const text = [
      'Datum;Zeit;Temperatur Außen [°C]',
      '24.12.2026;22:00;-1,5',
      '24.12.2026;23:00;-2,25',
      '25.12.2026;00:00;-2,75',
    ].join('\r\n');
    expect(detectDelimiter(text)).toBe(';');
    const inspection = inspectTemperatureCsv(text);
    expect(inspection.proposal).toMatchObject({
      timestampColumn: null,
      dateColumn: 'Datum',
      timeColumn: 'Zeit',
      temperatureColumn: 'Temperatur Außen [°C]',
      dateOrder: 'DMY',
      dateOrderAmbiguous: false,
      decimalComma: true,
      unit: 'C',
    });
    const parsed = parseTemperatureCsv(text, { ...inspection.proposal, unit: 'C' });
    expect(parsed.readings).toEqual([
      { at: '2026-12-24T22:00', temperatureC: -1.5 },
      { at: '2026-12-24T23:00', temperatureC: -2.25 },
      { at: '2026-12-25T00:00', temperatureC: -2.75 },
    ]);
    expect(parsed.startDate).toBe('2026-12-24');
    expect(parsed.endDate).toBe('2026-12-25');
  });

  it('detects tab-delimited files', () => {
    expect(detectDelimiter('time\ttemp\n2026-01-01 00:00\t1.0\n2026-01-01 01:00\t1.5\n')).toBe('\t');
  });

  it('guesses °F from the header, and from values too warm for outdoor °C', () => {
    const named = inspectTemperatureCsv('Date/Time,Temp (°F)\n01/05/2026 1:00 AM,28.4\n01/05/2026 2:00 AM,27.9\n');
    expect(named.proposal.unit).toBe('F');
    const unnamed = inspectTemperatureCsv(
      'time,reading\n2026-07-01 14:00,88\n2026-07-01 15:00,90\n2026-07-01 16:00,87\n',
    );
    expect(unnamed.proposal.unit).toBe('F');
    expect(unnamed.proposal.temperatureColumn).toBe('reading');
  });

  it('converts °F to °C (32 °F = 0 °C, 50 °F = 10 °C by definition) and reads AM/PM month-first times', () => {
    const text = 'Date/Time,Temp (°F)\n01/13/2026 11:00 PM,32\n01/14/2026 12:00 AM,50\n';
    const inspection = inspectTemperatureCsv(text);
    expect(inspection.proposal.dateOrder).toBe('MDY');
    const parsed = parseTemperatureCsv(text, { ...inspection.proposal });
    expect(parsed.readings[0]).toEqual({ at: '2026-01-13T23:00', temperatureC: 0 });
    expect(parsed.readings[1].at).toBe('2026-01-14T00:00');
    expect(parsed.readings[1].temperatureC).toBeCloseTo(10, 10);
  });

  it('proposes minimum and maximum columns of a daily file', () => {
    const text = 'date,tmin_c,tmax_c\n2026-01-01,-6.1,2.3\n2026-01-02,-7.0,1.1\n2026-01-03,-4.2,3.0\n';
    const inspection = inspectTemperatureCsv(text);
    expect(inspection.proposal).toMatchObject({
      timestampColumn: 'date',
      minColumn: 'tmin_c',
      maxColumn: 'tmax_c',
      temperatureColumn: null,
      resolution: 'daily',
    });
    const parsed = parseTemperatureCsv(text, inspection.proposal);
    expect(parsed.resolution).toBe('daily');
    expect(parsed.readings[0]).toEqual({ at: '2026-01-01', temperatureC: (-6.1 + 2.3) / 2, minC: -6.1, maxC: 2.3 });
  });

  it('works without a header row', () => {
    const inspection = inspectTemperatureCsv('2026-01-05T00:00,-3.5\n2026-01-05T01:00,-4.0\n');
    expect(inspection.hasHeader).toBe(false);
    expect(inspection.headers).toEqual(['Column 1', 'Column 2']);
    expect(inspection.proposal.timestampColumn).toBe('Column 1');
    expect(inspection.proposal.temperatureColumn).toBe('Column 2');
  });
});

describe('temperature log: encoding', () => {
  it('accepts UTF-8 with a byte-order mark', () => {
    const bytes = Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(HOURLY, 'utf8')]);
    const inspection = inspectTemperatureCsv(bytes);
    expect(inspection.headers[0]).toBe('Timestamp');
    expect(
      parseTemperatureCsv(bytes, { timestampColumn: 'Timestamp', temperatureColumn: 'Outdoor temp (°C)', unit: 'C' })
        .readings,
    ).toHaveLength(3);
    expect(decodeTemperatureCsv('\uFEFFa,b')).toBe('a,b');
  });

  it('refuses Windows-1252 bytes with the line they are on', () => {
    // '°' in Windows-1252 is the single byte 0xB0, invalid as UTF-8
    const bytes = Buffer.concat([
      Buffer.from('time,temp\n2026-01-01 00:00,1.0\n2026-01-01 01:00,2.0 ', 'latin1'),
      Buffer.from([0xb0]),
      Buffer.from('C\n'),
    ]);
    const error = logError(() => inspectTemperatureCsv(bytes));
    expect(error.errors[0].line).toBe(3);
    expect(error.errors[0].message).toMatch(/not UTF-8/);
    expect(error.field).toBe('file');
  });

  it('refuses UTF-16 files', () => {
    const bytes = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from('time,temp\n', 'utf16le')]);
    expect(logError(() => inspectTemperatureCsv(bytes)).errors[0].message).toMatch(/UTF-16/);
  });

  it('refuses text already decoded with replacement characters', () => {
    expect(logError(() => inspectTemperatureCsv('time,temp\n2026-01-01 00:00,1\uFFFD\n')).errors[0].line).toBe(2);
  });

  it('exports the size limit and refuses larger buffers', () => {
    expect(TEMPERATURE_LOG_MAX_BYTES).toBe(5 * 1024 * 1024);
    expect(
      logError(() => decodeTemperatureCsv(new Uint8Array(TEMPERATURE_LOG_MAX_BYTES + 1))).errors[0].message,
    ).toMatch(/larger/);
  });
});

describe('temperature log: errors by line', () => {
  const mapping = { timestampColumn: 'time', temperatureColumn: 'temp', unit: 'C' as const };

  it('refuses an empty file and a header with no rows', () => {
    expect(logError(() => inspectTemperatureCsv('')).errors[0]).toEqual({ line: null, message: 'the file is empty' });
    expect(logError(() => parseTemperatureCsv('  \n\n', mapping)).errors[0].message).toBe('the file is empty');
    expect(logError(() => parseTemperatureCsv('time,temp\n', mapping)).errors[0].message).toMatch(/no data rows/);
  });

  it('names a column that is not in the file', () => {
    const error = logError(() =>
      parseTemperatureCsv(HOURLY, { timestampColumn: 'Timestamp', temperatureColumn: 'Outside', unit: 'C' }),
    );
    expect(error.errors[0].line).toBe(1);
    expect(error.errors[0].message).toMatch(/'Outside' is not in the file/);
  });

  it('lists malformed rows, non-numbers, impossible temperatures and bad times with their lines', () => {
    const text = [
      'time,temp',
      '2026-01-01 00:00,1.0',
      '2026-01-01 01:00', // too few fields
      '2026-01-01 02:00,abc', // not a number
      '2026-01-01 03:00,75', // impossible °C
      '2026-13-01 04:00,1.0', // no month 13
      '2026-01-01 05:00,2.0',
    ].join('\n');
    const error = logError(() => parseTemperatureCsv(text, mapping));
    expect(error.errors.map((problem) => problem.line)).toEqual([3, 4, 5, 6]);
    expect(error.errors[0].message).toMatch(/1 field/);
    expect(error.errors[1].message).toMatch(/'abc' is not a number/);
    expect(error.errors[2].message).toMatch(/outside -60…60 °C/);
    expect(error.errors[3].message).toMatch(/not a date and time/);
  });

  it('refuses duplicate and out-of-order times', () => {
    const text = [
      'time,temp',
      '2026-01-01 00:00,1',
      '2026-01-01 01:00,1',
      '2026-01-01 01:00,2',
      '2026-01-01 00:30,2',
    ].join('\n');
    const error = logError(() => parseTemperatureCsv(text, mapping));
    expect(error.errors).toEqual([
      { line: 4, message: 'the time 2026-01-01T01:00 repeats line 3' },
      {
        line: 5,
        message: 'the time 2026-01-01T00:30 comes before 2026-01-01T01:00 on line 3; rows must be in time order',
      },
    ]);
  });

  it('reports an unclosed quote with its line', () => {
    const error = logError(() => parseTemperatureCsv('time,temp\n2026-01-01 00:00,"1\n2026-01-01 01:00,2\n', mapping));
    expect(error.errors[0].message).toMatch(/quoted field is never closed/);
    expect(error.errors[0].line).toBeGreaterThanOrEqual(2);
  });

  it('lists the first 20 problems and counts the rest', () => {
    const rows = ['time,temp'];
    for (let hour = 0; hour < 30; hour++)
      rows.push(`2026-01-02 ${String(hour % 24).padStart(2, '0')}:${hour < 24 ? '00' : '30'},x`);
    const error = logError(() => parseTemperatureCsv(rows.join('\n'), mapping));
    expect(error.errors).toHaveLength(MAX_LISTED_ERRORS);
    expect(error.moreErrorCount).toBe(10);
    expect(error.message).toMatch(/^30 problems/);
  });

  it('lists each bad line once, joining the problems found on it, and counts further bad lines', () => {
    const rows = ['date,tmin,tmax'];
    for (let day = 1; day <= 25; day++) rows.push(`2026-01-${String(day).padStart(2, '0')},low,high`);
    const error = logError(() =>
      parseTemperatureCsv(rows.join('\n'), { dateColumn: 'date', minColumn: 'tmin', maxColumn: 'tmax', unit: 'C' }),
    );
    const lines = error.errors.map((problem) => problem.line);
    expect(lines).toEqual(Array.from({ length: MAX_LISTED_ERRORS }, (_, index) => index + 2));
    expect(error.errors[0].message).toBe("the minimum 'low' is not a number; the maximum 'high' is not a number");
    expect(error.moreErrorCount).toBe(5);
  });

  it(`refuses a file of more than ${TEMPERATURE_LOG_MAX_ROWS} data rows, naming the limit`, () => {
    const text = 'time,temp\n' + '2026-01-01 00:00,1\n'.repeat(TEMPERATURE_LOG_MAX_ROWS + 1);
    const error = logError(() => parseTemperatureCsv(text, mapping));
    expect(error.errors).toEqual([{ line: null, message: expect.stringContaining('at most 200,000') }]);
    expect(logError(() => inspectTemperatureCsv(text)).errors[0].message).toMatch(/200,001 data rows/);
  });

  it('refuses °F values outside the plausible range after conversion', () => {
    const error = logError(() => parseTemperatureCsv('time,temp\n2026-01-01 00:00,150\n', { ...mapping, unit: 'F' }));
    expect(error.errors[0]).toMatchObject({ line: 2 });
    expect(error.errors[0].message).toMatch(/−76…140 °F/);
  });

  it('skips blank logger gaps but counts them', () => {
    const parsed = parseTemperatureCsv(
      'time,temp\n2026-01-01 00:00,1\n2026-01-01 01:00,\n2026-01-01 02:00,3\n',
      mapping,
    );
    expect(parsed.readings.map((reading) => reading.at)).toEqual(['2026-01-01T00:00', '2026-01-01T02:00']);
    expect(parsed.skippedBlankRows).toBe(1);
    expect(parsed.rowCount).toBe(3);
  });

  it('keeps a stated time zone on the readings', () => {
    const parsed = parseTemperatureCsv('time,temp\n2026-01-01T05:00Z,1\n2026-01-01T06:00Z,2\n', mapping);
    expect(parsed.readings[0].at).toBe('2026-01-01T05:00Z');
  });
});
