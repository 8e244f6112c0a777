// A temperature file's text (UTF-8 only, refused with a fix otherwise), its delimiter and its rows.
import { parse } from 'csv-parse/sync';
import { fail, TEMPERATURE_LOG_MAX_BYTES } from './csv-problems';

export type Delimiter = ',' | ';' | '\t';

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

export const DELIMITERS: readonly Delimiter[] = [',', ';', '\t'];

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

export interface RawRow {
  cells: string[];
  line: number;
}

export function readRows(text: string, delimiter: Delimiter): RawRow[] {
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
