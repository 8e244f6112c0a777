// The first step of reading a temperature file: guess its layout and propose which columns hold
// the time and the temperature, for the user to confirm or correct.
import { maxOf } from '@thermbay/engine/numbers';
import { fail, refuseTooManyRows, SAMPLE_ROW_COUNT } from './csv-problems';
import { decodeTemperatureCsv, detectDelimiter, readRows, type Delimiter, type RawRow } from './csv-text';
import { parseNumber, parseStamp, parseTime, stampHours, stampOfRow, type DateOrder } from './csv-values';

export type TemperatureUnit = 'C' | 'F';
export type LogResolution = 'hourly' | 'daily';

export interface ColumnProposal {
  /** one column holding date and time (or the date alone in a daily file) */
  timestampColumn: string | null;
  /** separate date and time columns, when the file splits them */
  dateColumn: string | null;
  timeColumn: string | null;
  /** the (mean) temperature; null when a daily file has only minimum and maximum */
  temperatureColumn: string | null;
  minColumn: string | null;
  maxColumn: string | null;
  unit: TemperatureUnit;
  /** why the unit was guessed, in words */
  unitReason: string;
  resolution: LogResolution;
  dateOrder: DateOrder;
  /** true when day-first and month-first both fit the dates seen; the user should confirm */
  dateOrderAmbiguous: boolean;
  decimalComma: boolean;
}

export interface TemperatureCsvInspection {
  delimiter: Delimiter;
  hasHeader: boolean;
  /** column names (from the header, or 'Column 1', 'Column 2' … without one) */
  headers: string[];
  /** the first data rows as they appear */
  sampleRows: string[][];
  /** data rows in the file */
  dataRowCount: number;
  proposal: ColumnProposal;
  notes: string[];
}

/** How the user confirms the columns; names are entries of `headers`. */
export interface TemperatureColumnMapping {
  timestampColumn?: string | null;
  dateColumn?: string | null;
  timeColumn?: string | null;
  temperatureColumn?: string | null;
  minColumn?: string | null;
  maxColumn?: string | null;
  unit: TemperatureUnit;
  /** inferred from the times when absent */
  resolution?: LogResolution;
  dateOrder?: DateOrder;
  decimalComma?: boolean;
  /** detected when absent */
  delimiter?: Delimiter;
  hasHeader?: boolean;
}

const TIME_HEADER = /date|time|stamp|datum|zeit|fecha|hora|heure|jour|day|tag/i;
const TEMPERATURE_HEADER = /temp|°|deg|outdoor|outside|ambient|air|t_?out|tout|t_?air|\bt\b/i;
const NOT_TEMPERATURE_HEADER =
  /dew|rh|humid|wind|rain|precip|solar|rad|press|batt|volt|lux|par|co2|soil|inside|indoor|setpoint/i;
const MIN_HEADER = /\bmin|minimum|low|tmin|_min/i;
const MAX_HEADER = /\bmax|maximum|high|tmax|_max/i;

export function uniqueHeaders(cells: string[]): string[] {
  const seen = new Map<string, number>();
  return cells.map((cell, index) => {
    const name = cell.trim() === '' ? `Column ${index + 1}` : cell.trim();
    const count = (seen.get(name) ?? 0) + 1;
    seen.set(name, count);
    return count === 1 ? name : `${name} (${count})`;
  });
}

export function guessDateOrder(values: string[], delimiter: Delimiter): { order: DateOrder; ambiguous: boolean } {
  let dayFirstSeen = false;
  let monthFirstSeen = false;
  let yearLast = false;
  for (const value of values) {
    const match = /^(\d{1,2})[-/.](\d{1,2})[-/.](\d{2,4})\b/.exec(value.trim());
    if (!match) continue;
    yearLast = true;
    if (Number(match[1]) > 12) dayFirstSeen = true;
    if (Number(match[2]) > 12) monthFirstSeen = true;
  }
  if (!yearLast) return { order: 'YMD', ambiguous: false };
  if (dayFirstSeen && !monthFirstSeen) return { order: 'DMY', ambiguous: false };
  if (monthFirstSeen && !dayFirstSeen) return { order: 'MDY', ambiguous: false };
  // Only days ≤ 12 seen: semicolon files come mostly from day-first locales.
  return { order: delimiter === ',' ? 'MDY' : 'DMY', ambiguous: true };
}

function share<T>(values: T[], test: (value: T) => boolean): number {
  if (values.length === 0) return 0;
  return values.filter(test).length / values.length;
}

export function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted.length === 0 ? NaN : sorted[Math.floor(sorted.length / 2)];
}

/** Reads the start of the file and proposes which columns hold the time and the temperature. */
export function inspectTemperatureCsv(input: string | Uint8Array): TemperatureCsvInspection {
  const text = decodeTemperatureCsv(input);
  if (text.trim() === '') fail(null, 'the file is empty');
  const delimiter = detectDelimiter(text);
  const rows = readRows(text, delimiter);
  if (rows.length === 0) fail(null, 'the file is empty');

  const hasHeader = looksLikeHeader(rows[0]);
  const dataRows = hasHeader ? rows.slice(1) : rows;
  refuseTooManyRows(dataRows.length);
  if (dataRows.length === 0) fail(rows[0].line, 'the file has a header but no data rows');
  const columnCount = maxOf(rows.slice(0, 50).map((row) => row.cells.length));
  if (columnCount < 2) {
    fail(
      rows[0].line,
      'only one column found; the file needs a time column and a temperature column separated by commas, semicolons or tabs',
    );
  }
  const headerCells = hasHeader ? rows[0].cells : [];
  const headers = uniqueHeaders(Array.from({ length: columnCount }, (_, index) => headerCells[index] ?? ''));
  const sample = dataRows.slice(0, 200);
  const column = (index: number) => sample.map((row) => row.cells[index] ?? '').filter((cell) => cell !== '');

  const decimalComma =
    delimiter !== ',' && sample.some((row) => row.cells.some((cell) => /^[-+\u2212]?\d+,\d+$/.test(cell.trim())));
  const { order: dateOrder, ambiguous: dateOrderAmbiguous } = guessDateOrder(
    sample.map((row) => row.cells.join(' ')),
    delimiter,
  );

  interface ColumnKind {
    index: number;
    stamp: number;
    dateOnly: number;
    timeOnly: number;
    numeric: number;
  }
  const kinds: ColumnKind[] = headers.map((_, index) => {
    const values = column(index);
    const stamps = values.map((value) => parseStamp(value, dateOrder));
    return {
      index,
      stamp: share(stamps, (stamp) => stamp !== null && stamp.hour !== null),
      dateOnly: share(stamps, (stamp) => stamp !== null && stamp.hour === null),
      timeOnly: share(values, (value) => parseTime(value) !== null),
      numeric: share(values, (value) => parseNumber(value, decimalComma) !== null),
    };
  });
  const byHeader = (kind: ColumnKind) => (TIME_HEADER.test(headers[kind.index]) ? 1 : 0);
  const notes: string[] = [];

  let timestampColumn: string | null = null;
  let dateColumn: string | null = null;
  let timeColumn: string | null = null;
  const stampColumns = kinds.filter((kind) => kind.stamp >= 0.9).sort((a, b) => byHeader(b) - byHeader(a));
  const dateColumns = kinds.filter((kind) => kind.dateOnly >= 0.9).sort((a, b) => byHeader(b) - byHeader(a));
  const timeColumns = kinds.filter((kind) => kind.timeOnly >= 0.9);
  let timeIndexes: number[] = [];
  if (stampColumns.length > 0) {
    timestampColumn = headers[stampColumns[0].index];
    timeIndexes = [stampColumns[0].index];
  } else if (dateColumns.length > 0 && timeColumns.length > 0) {
    dateColumn = headers[dateColumns[0].index];
    timeColumn = headers[timeColumns[0].index];
    timeIndexes = [dateColumns[0].index, timeColumns[0].index];
  } else if (dateColumns.length > 0) {
    timestampColumn = headers[dateColumns[0].index];
    timeIndexes = [dateColumns[0].index];
  } else {
    notes.push('No column of dates and times was recognised; choose the time column yourself.');
  }

  const numericColumns = kinds.filter((kind) => kind.numeric >= 0.9 && !timeIndexes.includes(kind.index));
  const named = (pattern: RegExp) =>
    numericColumns.find(
      (kind) =>
        pattern.test(headers[kind.index]) &&
        TEMPERATURE_HEADER.test(headers[kind.index]) &&
        !NOT_TEMPERATURE_HEADER.test(headers[kind.index]),
    ) ??
    numericColumns.find(
      (kind) => pattern.test(headers[kind.index]) && !NOT_TEMPERATURE_HEADER.test(headers[kind.index]),
    );
  const minKind = hasHeader ? named(MIN_HEADER) : undefined;
  const maxKind = hasHeader ? named(MAX_HEADER) : undefined;
  const plainCandidates = numericColumns.filter((kind) => kind !== minKind && kind !== maxKind);
  const temperatureKind =
    plainCandidates.find(
      (kind) => TEMPERATURE_HEADER.test(headers[kind.index]) && !NOT_TEMPERATURE_HEADER.test(headers[kind.index]),
    ) ??
    plainCandidates.find((kind) => !NOT_TEMPERATURE_HEADER.test(headers[kind.index])) ??
    (minKind && maxKind ? undefined : plainCandidates[0]);
  if (!temperatureKind && !(minKind && maxKind))
    notes.push('No column of temperatures was recognised; choose it yourself.');

  // Resolution from the spacing of the first rows' times.
  let resolution: LogResolution = 'hourly';
  const stampsInOrder: number[] = [];
  for (const row of sample.slice(0, 60)) {
    const stamp = stampOfRow(row.cells, headers, { timestampColumn, dateColumn, timeColumn }, dateOrder);
    if (stamp) stampsInOrder.push(stampHours(stamp));
  }
  const spacings = stampsInOrder
    .slice(1)
    .map((value, index) => value - stampsInOrder[index])
    .filter((gap) => gap > 0);
  if (timeIndexes.length === 1 && kinds[timeIndexes[0]].dateOnly >= 0.9) resolution = 'daily';
  else if (spacings.length > 0 && median(spacings) >= 20) resolution = 'daily';

  // Unit: from the header first, else from the values.
  const unitColumns = [temperatureKind, minKind, maxKind].filter((kind): kind is ColumnKind => kind !== undefined);
  const unitHeaderText = unitColumns.map((kind) => headers[kind.index]).join(' ');
  let unit: TemperatureUnit = 'C';
  let unitReason: string;
  if (
    /°\s*F|deg\s*F|\(F\)|\[F\]|fahrenheit|_F\b|\bF\b/i.test(unitHeaderText) &&
    !/°\s*C|deg\s*C|celsius/i.test(unitHeaderText)
  ) {
    unit = 'F';
    unitReason = 'the column name says °F';
  } else if (/°\s*C|deg\s*C|\(C\)|\[C\]|celsius|_C\b|\bC\b/i.test(unitHeaderText)) {
    unitReason = 'the column name says °C';
  } else {
    const values = unitColumns.flatMap((kind) =>
      column(kind.index)
        .map((value) => parseNumber(value, decimalComma))
        .filter((value): value is number => value !== null),
    );
    const highest = values.length > 0 ? maxOf(values) : NaN;
    const middle = median(values);
    if (highest > 50 || middle > 40) {
      unit = 'F';
      unitReason = `values up to ${highest} (median ${middle}) are too warm for outdoor °C`;
    } else {
      unitReason = 'the column name gives no unit and the values fit °C; check this';
    }
  }
  if (dateOrderAmbiguous) {
    notes.push(
      `Dates could be day-first or month-first; ${dateOrder === 'DMY' ? 'day-first' : 'month-first'} was assumed.`,
    );
  }

  return {
    delimiter,
    hasHeader,
    headers,
    sampleRows: dataRows.slice(0, SAMPLE_ROW_COUNT).map((row) => row.cells),
    dataRowCount: dataRows.length,
    proposal: {
      timestampColumn,
      dateColumn,
      timeColumn,
      temperatureColumn: temperatureKind ? headers[temperatureKind.index] : null,
      minColumn: minKind && maxKind ? headers[minKind.index] : null,
      maxColumn: minKind && maxKind ? headers[maxKind.index] : null,
      unit,
      unitReason,
      resolution,
      dateOrder,
      dateOrderAmbiguous,
      decimalComma,
    },
    notes,
  };
}

/** A row with a cell of letters that is neither a date nor a time names the columns. */
function looksLikeHeader(row: RawRow): boolean {
  return row.cells.some(
    (cell) =>
      /[A-Za-z°]/.test(cell) &&
      parseStamp(cell, 'YMD') === null &&
      parseStamp(cell, 'DMY') === null &&
      parseTime(cell) === null,
  );
}

/** Header and date order of already-read rows (for parse calls that do not state them). */
export function inspectLayout(rows: RawRow[], delimiter: Delimiter): { hasHeader: boolean; dateOrder: DateOrder } {
  const hasHeader = looksLikeHeader(rows[0]);
  const sample = (hasHeader ? rows.slice(1) : rows).slice(0, 200).map((row) => row.cells.join(' '));
  return { hasHeader, dateOrder: guessDateOrder(sample, delimiter).order };
}
