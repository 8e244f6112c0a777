import { parse } from 'csv-parse/sync';
import { EngineInputError } from '@thermbay/engine/errors';
import { daysInMonth, isoDate, pad2 } from '@thermbay/engine/climate/calendar-days';
import { OUTDOOR_TEMPERATURE_LIMITS_C, TEMPERATURE_LOG_LIMITS } from '@thermbay/engine/vocabulary';
import { maxOf } from '@thermbay/engine/numbers';

/**
 * Logged outdoor temperatures from a CSV file (a controller's or weather station's export).
 * Two steps: `inspectTemperatureCsv` guesses the layout and proposes which columns hold what;
 * the user confirms or corrects the proposal; `parseTemperatureCsv` then reads every row and
 * either returns the readings or throws a TemperatureLogError listing what is wrong, line by line.
 */

/** Largest file the API accepts, bytes. */
export const TEMPERATURE_LOG_MAX_BYTES = TEMPERATURE_LOG_LIMITS.maxBytes;
/** Most data rows the API reads from one file. */
export const TEMPERATURE_LOG_MAX_ROWS = TEMPERATURE_LOG_LIMITS.maxRows;
/** Errors listed one by one; the rest are only counted. */
export const MAX_LISTED_ERRORS = 20;
/** Data rows shown back to the user when proposing columns. */
export const SAMPLE_ROW_COUNT = 10;

export type Delimiter = ',' | ';' | '\t';
export type TemperatureUnit = 'C' | 'F';
export type LogResolution = 'hourly' | 'daily';
/** order of day, month and year in dates written with / . or - and a year at the end */
export type DateOrder = 'YMD' | 'MDY' | 'DMY';

export interface LogProblem {
  /** 1-based line of the file, or null for the file as a whole */
  line: number | null;
  message: string;
}

/** A file that cannot be read as a temperature log; the API answers 422 with the list. */
export class TemperatureLogError extends EngineInputError {
  constructor(
    public readonly errors: LogProblem[],
    /** problems found beyond the listed ones */
    public readonly moreErrorCount = 0,
  ) {
    super(
      'file',
      errors.length === 1 && moreErrorCount === 0
        ? describeProblem(errors[0])
        : `${errors.length + moreErrorCount} problems in the temperature file, first: ${describeProblem(errors[0])}`,
    );
    this.name = 'TemperatureLogError';
  }
}

function describeProblem(problem: LogProblem): string {
  return problem.line === null ? problem.message : `line ${problem.line}: ${problem.message}`;
}

/**
 * Collects problems line by line: the first MAX_LISTED_ERRORS bad lines are listed, each once
 * (a second problem on a listed line joins its message); further bad lines are only counted.
 */
class ProblemList {
  readonly listed: LogProblem[] = [];
  more = 0;
  private readonly listedByLine = new Map<number | null, LogProblem>();
  private readonly unlistedLines = new Set<number | null>();

  add(line: number | null, message: string): void {
    const already = this.listedByLine.get(line);
    if (already) {
      if (!already.message.split('; ').includes(message)) already.message += `; ${message}`;
      return;
    }
    if (this.listed.length < MAX_LISTED_ERRORS) {
      const problem = { line, message };
      this.listed.push(problem);
      this.listedByLine.set(line, problem);
    } else if (!this.unlistedLines.has(line)) {
      this.unlistedLines.add(line);
      this.more++;
    }
  }

  get count(): number {
    return this.listed.length + this.more;
  }

  throwIfAny(): void {
    if (this.count > 0) throw new TemperatureLogError(this.listed, this.more);
  }
}

function refuseTooManyRows(dataRowCount: number): void {
  if (dataRowCount > TEMPERATURE_LOG_MAX_ROWS) {
    fail(
      null,
      `the file has ${dataRowCount.toLocaleString('en-US')} data rows; at most ${TEMPERATURE_LOG_MAX_ROWS.toLocaleString('en-US')} are read at once, so split the log into shorter periods`,
    );
  }
}

function fail(line: number | null, message: string): never {
  throw new TemperatureLogError([{ line, message }]);
}

// ---------------------------------------------------------------------------------------------
// Encoding

/** Byte offset of the first byte that breaks UTF-8, or −1 if the bytes are valid UTF-8. */
function firstInvalidUtf8Offset(bytes: Uint8Array): number {
  let index = 0;
  while (index < bytes.length) {
    const byte = bytes[index];
    let extra: number;
    let min: number;
    if (byte < 0x80) {
      index++;
      continue;
    } else if (byte >= 0xc2 && byte <= 0xdf) {
      extra = 1;
      min = 0x80;
    } else if (byte >= 0xe0 && byte <= 0xef) {
      extra = 2;
      min = 0x800;
    } else if (byte >= 0xf0 && byte <= 0xf4) {
      extra = 3;
      min = 0x10000;
    } else {
      return index;
    }
    if (index + extra >= bytes.length) return index;
    let codePoint = byte & (0xff >> (extra + 2));
    for (let k = 1; k <= extra; k++) {
      const next = bytes[index + k];
      if ((next & 0xc0) !== 0x80) return index;
      codePoint = (codePoint << 6) | (next & 0x3f);
    }
    if (codePoint < min || codePoint > 0x10ffff || (codePoint >= 0xd800 && codePoint <= 0xdfff)) return index;
    index += extra + 1;
  }
  return -1;
}

function lineOfOffset(bytes: Uint8Array, offset: number): number {
  let line = 1;
  for (let index = 0; index < offset; index++) if (bytes[index] === 0x0a) line++;
  return line;
}

/**
 * The file's text: UTF-8 (a byte-order mark is accepted and dropped). Anything else is refused
 * with a message saying how to fix it, since guessing a legacy code page would silently garble
 * degree signs and column names.
 */
export function decodeTemperatureCsv(input: string | Uint8Array): string {
  let text: string;
  if (typeof input === 'string') {
    text = input;
    const replacement = text.indexOf('\uFFFD');
    if (replacement >= 0) {
      const line = text.slice(0, replacement).split('\n').length;
      fail(
        line,
        'the file contains characters that are not valid UTF-8 (shown as �); save it as "CSV UTF-8" and upload it again',
      );
    }
  } else {
    const bytes = input;
    if (bytes.length > TEMPERATURE_LOG_MAX_BYTES) {
      fail(null, `the file is larger than ${TEMPERATURE_LOG_MAX_BYTES / 1024 / 1024} MB`);
    }
    if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
      fail(null, 'the file is saved as UTF-16 (Unicode text); save it as "CSV UTF-8" and upload it again');
    }
    const start = bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? 3 : 0;
    const body = bytes.subarray(start);
    const invalidAt = firstInvalidUtf8Offset(body);
    if (invalidAt >= 0) {
      fail(
        lineOfOffset(body, invalidAt),
        `the file is not UTF-8 (byte 0x${body[invalidAt].toString(16).toUpperCase().padStart(2, '0')} at position ${invalidAt + start + 1} looks like a legacy code page such as Windows-1252); save it as "CSV UTF-8" and upload it again`,
      );
    }
    text = new TextDecoder('utf-8').decode(body);
  }
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  const nul = text.indexOf('\u0000');
  if (nul >= 0) {
    fail(
      text.slice(0, nul).split('\n').length,
      'the file contains NUL bytes: it is binary or UTF-16, not a UTF-8 CSV file',
    );
  }
  return text;
}

// ---------------------------------------------------------------------------------------------
// Layout

const DELIMITERS: readonly Delimiter[] = [',', ';', '\t'];

/** Count of a delimiter outside double quotes on one line. */
function countOutsideQuotes(line: string, delimiter: string): number {
  let count = 0;
  let quoted = false;
  for (const char of line) {
    if (char === '"') quoted = !quoted;
    else if (!quoted && char === delimiter) count++;
  }
  return count;
}

/** The delimiter found the same number of times (at least once) on most of the first lines. */
export function detectDelimiter(text: string): Delimiter {
  const lines = text
    .split(/\r?\n/)
    .filter((line) => line.trim() !== '')
    .slice(0, 20);
  let best: Delimiter = ',';
  let bestScore = 0;
  for (const delimiter of DELIMITERS) {
    const counts = lines.map((line) => countOutsideQuotes(line, delimiter));
    const tally = new Map<number, number>();
    for (const count of counts) if (count > 0) tally.set(count, (tally.get(count) ?? 0) + 1);
    let modeLines = 0;
    for (const lineCount of tally.values()) modeLines = Math.max(modeLines, lineCount);
    // Semicolon and tab files often use a decimal comma, so a consistent ; or tab beats commas.
    const score = modeLines + (delimiter === ',' ? 0 : 0.5);
    if (modeLines > 0 && score > bestScore) {
      best = delimiter;
      bestScore = score;
    }
  }
  return best;
}

interface RawRow {
  cells: string[];
  line: number;
}

function readRows(text: string, delimiter: Delimiter): RawRow[] {
  let records: Array<{ record: string[]; info: { lines: number } }>;
  try {
    records = parse(text, {
      delimiter,
      info: true,
      relax_column_count: true,
      skip_empty_lines: true,
      trim: true,
      bom: true,
    }) as unknown as Array<{ record: string[]; info: { lines: number } }>;
  } catch (error) {
    const parseError = error as { lines?: number; code?: string; message?: string };
    const what =
      parseError.code === 'CSV_QUOTE_NOT_CLOSED'
        ? 'a quoted field is never closed'
        : parseError.code === 'INVALID_OPENING_QUOTE' || parseError.code === 'CSV_INVALID_CLOSING_QUOTE'
          ? 'a quote character stands inside a field; quote the whole field or remove it'
          : `the row cannot be read (${parseError.message ?? 'malformed CSV'})`;
    fail(parseError.lines ?? null, what);
  }
  return records
    .map(({ record, info }) => ({
      cells: record,
      // info.lines is the line a record ends on; count back over line breaks inside quoted fields
      line: info.lines - record.reduce((sum, cell) => sum + (cell.match(/\n/g)?.length ?? 0), 0),
    }))
    .filter((row) => row.cells.some((cell) => cell !== ''));
}

// ---------------------------------------------------------------------------------------------
// Dates, times and numbers

interface ParsedDate {
  year: number;
  month: number;
  day: number;
}

interface ParsedStamp {
  date: ParsedDate;
  /** hours after midnight, or null for a date alone */
  hour: number | null;
  /** '+HH:MM' / 'Z' when the stamp names its zone */
  zone: string | null;
}

function validDate(year: number, month: number, day: number): ParsedDate | null {
  if (year < 100) year += 2000;
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return null;
  return { year, month, day };
}

/** A date alone: YYYY-MM-DD, YYYY/MM/DD, YYYY.MM.DD, or day/month/year in the given order. */
function parseDate(text: string, order: DateOrder): ParsedDate | null {
  let match = /^(\d{4})[-/.](\d{1,2})[-/.](\d{1,2})$/.exec(text);
  if (match) return validDate(Number(match[1]), Number(match[2]), Number(match[3]));
  match = /^(\d{1,2})[-/.](\d{1,2})[-/.](\d{4}|\d{2})$/.exec(text);
  if (match) {
    const first = Number(match[1]);
    const second = Number(match[2]);
    const year = Number(match[3]);
    return order === 'MDY' ? validDate(year, first, second) : validDate(year, second, first);
  }
  return null;
}

/** A time of day: H:MM, HH:MM:SS(.fff), optionally with AM/PM. */
function parseTime(text: string): number | null {
  const match = /^(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,]\d+)?)?\s*([AaPp][Mm])?$/.exec(text);
  if (!match) return null;
  let hour = Number(match[1]);
  const minute = Number(match[2]);
  const second = Number(match[3] ?? 0);
  const meridiem = match[4]?.toUpperCase();
  if (meridiem) {
    if (hour < 1 || hour > 12) return null;
    hour = (hour % 12) + (meridiem === 'PM' ? 12 : 0);
  }
  if (hour > 24 || minute > 59 || second > 59 || (hour === 24 && (minute > 0 || second > 0))) return null;
  return hour + minute / 60 + second / 3600;
}

function parseStamp(text: string, order: DateOrder): ParsedStamp | null {
  const trimmed = text.trim();
  const zoneMatch = /(Z|[+-]\d{2}:?\d{2})$/.exec(trimmed);
  let body = trimmed;
  let zone: string | null = null;
  if (zoneMatch && /\d[T ]?\d{1,2}:\d{2}/.test(trimmed)) {
    zone = zoneMatch[1] === 'Z' ? 'Z' : `${zoneMatch[1].slice(0, 3)}:${zoneMatch[1].slice(-2)}`;
    body = trimmed.slice(0, -zoneMatch[1].length).trim();
  }
  const split = /^(\S+?)(?:[T ]+(.+))?$/.exec(body);
  if (!split) return null;
  const date = parseDate(split[1], order);
  if (!date) return null;
  if (split[2] === undefined) return zone ? null : { date, hour: null, zone: null };
  const hour = parseTime(split[2].trim());
  if (hour === null) return null;
  return { date, hour, zone };
}

/** A number as loggers write it: decimal point or (when told) comma, Unicode minus, an optional unit suffix. */
function parseNumber(text: string, decimalComma: boolean): number | null {
  let cleaned = text
    .trim()
    .replace(/\u2212/g, '-')
    .replace(/\s*°?\s*[CcFf]$/, '')
    .replace(/°$/, '')
    .trim();
  if (decimalComma) cleaned = cleaned.replace(',', '.');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(cleaned)) return null;
  return Number(cleaned);
}

// ---------------------------------------------------------------------------------------------
// Inspection

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

function uniqueHeaders(cells: string[]): string[] {
  const seen = new Map<string, number>();
  return cells.map((cell, index) => {
    const name = cell.trim() === '' ? `Column ${index + 1}` : cell.trim();
    const count = (seen.get(name) ?? 0) + 1;
    seen.set(name, count);
    return count === 1 ? name : `${name} (${count})`;
  });
}

function guessDateOrder(values: string[], delimiter: Delimiter): { order: DateOrder; ambiguous: boolean } {
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

function median(values: number[]): number {
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

  const firstRowLooksLikeHeader = rows[0].cells.some(
    (cell) =>
      /[A-Za-z°]/.test(cell) &&
      parseStamp(cell, 'YMD') === null &&
      parseStamp(cell, 'DMY') === null &&
      parseTime(cell) === null,
  );
  const hasHeader = firstRowLooksLikeHeader;
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
    const stamp = stampOfRow(
      row.cells,
      headers,
      { timestampColumn, dateColumn, timeColumn, unit: 'C', dateOrder },
      dateOrder,
    );
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

function stampHours(stamp: ParsedStamp): number {
  let hours = Date.UTC(stamp.date.year, stamp.date.month - 1, stamp.date.day) / 3_600_000 + (stamp.hour ?? 0);
  if (stamp.zone && stamp.zone !== 'Z') {
    const sign = stamp.zone[0] === '-' ? -1 : 1;
    hours -= sign * (Number(stamp.zone.slice(1, 3)) + Number(stamp.zone.slice(4, 6)) / 60);
  }
  return hours;
}

function stampOfRow(
  cells: string[],
  headers: string[],
  mapping: Pick<TemperatureColumnMapping, 'timestampColumn' | 'dateColumn' | 'timeColumn' | 'unit' | 'dateOrder'>,
  order: DateOrder,
): ParsedStamp | null {
  if (mapping.timestampColumn) {
    return parseStamp(cells[headers.indexOf(mapping.timestampColumn)] ?? '', order);
  }
  if (mapping.dateColumn && mapping.timeColumn) {
    const date = parseDate((cells[headers.indexOf(mapping.dateColumn)] ?? '').trim(), order);
    const hour = parseTime((cells[headers.indexOf(mapping.timeColumn)] ?? '').trim());
    return date && hour !== null ? { date, hour, zone: null } : null;
  }
  return null;
}

// ---------------------------------------------------------------------------------------------
// Parsing

export interface TemperatureLogReading {
  /** 'YYYY-MM-DDTHH:MM' (local time as logged, with its zone if the file gave one) or 'YYYY-MM-DD' for daily files */
  at: string;
  temperatureC: number;
  minC?: number;
  maxC?: number;
}

export interface ParsedTemperatureLog {
  readings: TemperatureLogReading[];
  /** 'YYYY-MM-DD' of the first and last reading */
  startDate: string;
  endDate: string;
  resolution: LogResolution;
  /** data rows read (readings plus skipped blank rows) */
  rowCount: number;
  /** rows without any temperature (blank cells), skipped */
  skippedBlankRows: number;
}

const { min: LOWEST_C, max: HIGHEST_C } = OUTDOOR_TEMPERATURE_LIMITS_C;

function toCelsius(value: number, unit: TemperatureUnit): number {
  return unit === 'F' ? (value - 32) / 1.8 : value;
}

function formatStamp(stamp: ParsedStamp, resolution: LogResolution): string {
  const date = isoDate(stamp.date);
  if (resolution === 'daily' || stamp.hour === null) return date;
  const totalMinutes = Math.round(stamp.hour * 60);
  // 24:00 means midnight at the end of the day
  const dayShift = Math.floor(totalMinutes / 1440);
  const minutes = totalMinutes % 1440;
  const shifted = dayShift
    ? isoDate(
        (() => {
          const next = new Date(Date.UTC(stamp.date.year, stamp.date.month - 1, stamp.date.day + dayShift));
          return { year: next.getUTCFullYear(), month: next.getUTCMonth() + 1, day: next.getUTCDate() };
        })(),
      )
    : date;
  return `${shifted}T${pad2(Math.floor(minutes / 60))}:${pad2(minutes % 60)}${stamp.zone ?? ''}`;
}

/**
 * Reads every row with the confirmed mapping. Returns readings in °C, or throws a
 * TemperatureLogError listing problems by line (the first 20, with a count of the rest).
 */
export function parseTemperatureCsv(
  input: string | Uint8Array,
  mapping: TemperatureColumnMapping,
): ParsedTemperatureLog {
  const text = decodeTemperatureCsv(input);
  if (text.trim() === '') fail(null, 'the file is empty');
  if (!mapping || (mapping.unit !== 'C' && mapping.unit !== 'F'))
    fail(null, "say whether temperatures are in 'C' or 'F'");
  const delimiter = mapping.delimiter ?? detectDelimiter(text);
  if (!DELIMITERS.includes(delimiter)) fail(null, 'the delimiter must be a comma, a semicolon or a tab');
  const rows = readRows(text, delimiter);
  if (rows.length === 0) fail(null, 'the file is empty');

  const inspection =
    mapping.hasHeader === undefined || mapping.dateOrder === undefined ? inspectLayout(rows, delimiter) : null;
  const hasHeader = mapping.hasHeader ?? inspection!.hasHeader;
  const columnCount = maxOf(rows.map((row) => row.cells.length));
  const headerCells = hasHeader ? rows[0].cells : [];
  const headers = uniqueHeaders(Array.from({ length: columnCount }, (_, index) => headerCells[index] ?? ''));
  const dataRows = hasHeader ? rows.slice(1) : rows;
  refuseTooManyRows(dataRows.length);
  if (dataRows.length === 0) fail(rows[0].line, 'the file has a header but no data rows');

  // Columns must exist.
  const headerLine = hasHeader ? rows[0].line : null;
  const problems = new ProblemList();
  const columnIndex = (name: string | null | undefined, role: string): number | null => {
    if (name === undefined || name === null || name === '') return null;
    const index = headers.indexOf(name);
    if (index < 0) {
      problems.add(headerLine, `the ${role} column '${name}' is not in the file (columns: ${headers.join(', ')})`);
      return null;
    }
    return index;
  };
  const stampIndex = columnIndex(mapping.timestampColumn, 'time');
  const dateIndex = columnIndex(mapping.dateColumn, 'date');
  const timeIndex = columnIndex(mapping.timeColumn, 'time-of-day');
  const temperatureIndex = columnIndex(mapping.temperatureColumn, 'temperature');
  const minIndex = columnIndex(mapping.minColumn, 'minimum');
  const maxIndex = columnIndex(mapping.maxColumn, 'maximum');
  problems.throwIfAny();
  if (stampIndex === null && dateIndex === null) {
    fail(headerLine, 'choose a time column, or a date column (with a time-of-day column for hourly logs)');
  }
  if (temperatureIndex === null && (minIndex === null || maxIndex === null)) {
    fail(headerLine, 'choose a temperature column, or both a minimum and a maximum column');
  }
  if ((minIndex === null) !== (maxIndex === null)) {
    fail(headerLine, 'a daily minimum column needs a maximum column too, and the other way round');
  }

  const order = mapping.dateOrder ?? inspection!.dateOrder;
  const decimalComma =
    mapping.decimalComma ??
    (delimiter !== ',' && dataRows.some((row) => row.cells.some((cell) => /^[-+\u2212]?\d+,\d+$/.test(cell.trim()))));
  const unit = mapping.unit;
  const usedIndexes = [stampIndex, dateIndex, timeIndex, temperatureIndex, minIndex, maxIndex].filter(
    (index): index is number => index !== null,
  );
  const neededFields = maxOf(usedIndexes) + 1;

  interface Pending {
    line: number;
    stamp: ParsedStamp;
    hours: number;
    temperatureC: number;
    minC?: number;
    maxC?: number;
  }
  const pending: Pending[] = [];
  let skippedBlankRows = 0;

  /** °C, 'blank' for an empty cell, undefined when the column is not mapped, null after recording a problem */
  const readTemperature = (
    cells: string[],
    index: number | null,
    what: string,
    line: number,
  ): number | null | 'blank' | undefined => {
    if (index === null) return undefined;
    const raw = (cells[index] ?? '').trim();
    if (raw === '') return 'blank';
    const value = parseNumber(raw, decimalComma);
    if (value === null) {
      problems.add(line, `the ${what} '${raw}' is not a number`);
      return null;
    }
    const celsius = toCelsius(value, unit);
    if (!(celsius >= LOWEST_C && celsius <= HIGHEST_C)) {
      problems.add(
        line,
        `the ${what} ${raw} °${unit} is outside ${LOWEST_C}…${HIGHEST_C} °C${unit === 'F' ? ' (−76…140 °F)' : ''}; check the unit and the column`,
      );
      return null;
    }
    return celsius;
  };

  for (const row of dataRows) {
    const { cells, line } = row;
    if (cells.length < neededFields) {
      problems.add(
        line,
        `the row has ${cells.length} field${cells.length === 1 ? '' : 's'}; the chosen columns need ${neededFields}`,
      );
      continue;
    }
    let stamp: ParsedStamp | null;
    if (stampIndex !== null) {
      stamp = parseStamp(cells[stampIndex], order);
      if (!stamp) {
        problems.add(line, `'${cells[stampIndex]}' is not a date and time this file's date order (${order}) allows`);
        continue;
      }
    } else if (timeIndex !== null) {
      const date = parseDate(cells[dateIndex!].trim(), order);
      const hour = parseTime(cells[timeIndex].trim());
      if (!date || hour === null) {
        problems.add(
          line,
          `'${cells[dateIndex!]} ${cells[timeIndex]}' is not a date and time this file's date order (${order}) allows`,
        );
        continue;
      }
      stamp = { date, hour, zone: null };
    } else {
      const date = parseDate(cells[dateIndex!].trim(), order);
      if (!date) {
        problems.add(line, `'${cells[dateIndex!]}' is not a date this file's date order (${order}) allows`);
        continue;
      }
      stamp = { date, hour: null, zone: null };
    }

    const mean = readTemperature(cells, temperatureIndex, 'temperature', line);
    const low = readTemperature(cells, minIndex, 'minimum', line);
    const high = readTemperature(cells, maxIndex, 'maximum', line);
    if (mean === null || low === null || high === null) continue;
    const meanValue = typeof mean === 'number' ? mean : undefined;
    let lowValue = typeof low === 'number' ? low : undefined;
    let highValue = typeof high === 'number' ? high : undefined;
    if (lowValue === undefined || highValue === undefined) {
      lowValue = undefined;
      highValue = undefined;
    }
    if (meanValue === undefined && lowValue === undefined) {
      // a logger gap: nothing to read on this row
      skippedBlankRows++;
      continue;
    }
    if (lowValue !== undefined && highValue !== undefined && lowValue > highValue) {
      problems.add(line, 'the minimum is above the maximum');
      continue;
    }
    const temperatureC = meanValue ?? (lowValue! + highValue!) / 2;
    pending.push({ line, stamp, hours: stampHours(stamp), temperatureC, minC: lowValue, maxC: highValue });
  }

  // Resolution and ordering.
  const spacings = pending
    .slice(1)
    .map((entry, index) => entry.hours - pending[index].hours)
    .filter((gap) => gap > 0);
  const allDates = pending.every((entry) => entry.stamp.hour === null);
  const resolution: LogResolution =
    mapping.resolution ?? (allDates || (spacings.length > 0 && median(spacings) >= 20) ? 'daily' : 'hourly');
  if (resolution === 'hourly' && allDates && pending.length > 0) {
    problems.add(pending[0].line, 'an hourly log needs a time of day; these rows carry dates only');
  }
  const seen = new Map<string, number>();
  let previous: Pending | null = null;
  for (const entry of pending) {
    const key = resolution === 'daily' ? isoDate(entry.stamp.date) : String(entry.hours);
    const earlier = seen.get(key);
    if (earlier !== undefined) {
      problems.add(entry.line, `the time ${formatStamp(entry.stamp, resolution)} repeats line ${earlier}`);
    } else {
      seen.set(key, entry.line);
      const entryKey = resolution === 'daily' ? Math.floor(entry.hours / 24) : entry.hours;
      const previousKey = previous
        ? resolution === 'daily'
          ? Math.floor(previous.hours / 24)
          : previous.hours
        : -Infinity;
      if (previous && entryKey < previousKey) {
        problems.add(
          entry.line,
          `the time ${formatStamp(entry.stamp, resolution)} comes before ${formatStamp(previous.stamp, resolution)} on line ${previous.line}; rows must be in time order`,
        );
      }
      previous = entry;
    }
  }
  if (pending.length === 0 && problems.count === 0) fail(null, 'the file has no rows with a temperature');
  problems.throwIfAny();

  const readings = pending.map((entry): TemperatureLogReading => {
    const reading: TemperatureLogReading = {
      at: formatStamp(entry.stamp, resolution),
      temperatureC: entry.temperatureC,
    };
    if (entry.minC !== undefined) reading.minC = entry.minC;
    if (entry.maxC !== undefined) reading.maxC = entry.maxC;
    return reading;
  });
  return {
    readings,
    startDate: isoDate(pending[0].stamp.date),
    endDate: isoDate(pending[pending.length - 1].stamp.date),
    resolution,
    rowCount: dataRows.length,
    skippedBlankRows,
  };
}

/** Header and date order of already-read rows (for parse calls that do not state them). */
function inspectLayout(rows: RawRow[], delimiter: Delimiter): { hasHeader: boolean; dateOrder: DateOrder } {
  const hasHeader = rows[0].cells.some(
    (cell) =>
      /[A-Za-z°]/.test(cell) &&
      parseStamp(cell, 'YMD') === null &&
      parseStamp(cell, 'DMY') === null &&
      parseTime(cell) === null,
  );
  const sample = (hasHeader ? rows.slice(1) : rows).slice(0, 200).map((row) => row.cells.join(' '));
  return { hasHeader, dateOrder: guessDateOrder(sample, delimiter).order };
}
