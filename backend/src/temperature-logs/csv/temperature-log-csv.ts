/**
 * Logged outdoor temperatures from a CSV file (a controller's or weather station's export).
 * Two steps: `inspectTemperatureCsv` (csv-inspection.ts) guesses the layout and proposes which
 * columns hold what; the user confirms or corrects the proposal; `parseTemperatureCsv` (here) then
 * reads every row and either returns the readings or throws a TemperatureLogError listing what is
 * wrong, line by line. The feature imports all of it from this file.
 */
import { isoDate, pad2 } from '@thermbay/engine/climate/calendar-days';
import { OUTDOOR_TEMPERATURE_LIMITS_C } from '@thermbay/engine/vocabulary';
import { fail, ProblemList, refuseTooManyRows } from './csv-problems';
import { decodeTemperatureCsv, DELIMITERS, detectDelimiter, readRows } from './csv-text';
import { maxOf } from '@thermbay/engine/numbers';
import {
  inspectLayout,
  median,
  uniqueHeaders,
  type LogResolution,
  type TemperatureColumnMapping,
  type TemperatureUnit,
} from './csv-inspection';
import { parseDate, parseNumber, parseStamp, parseTime, stampHours, type ParsedStamp } from './csv-values';

export {
  MAX_LISTED_ERRORS,
  SAMPLE_ROW_COUNT,
  TEMPERATURE_LOG_MAX_BYTES,
  TEMPERATURE_LOG_MAX_ROWS,
  TemperatureLogError,
  type LogProblem,
} from './csv-problems';
export { decodeTemperatureCsv, detectDelimiter, type Delimiter } from './csv-text';
export type { DateOrder } from './csv-values';
export {
  inspectTemperatureCsv,
  type ColumnProposal,
  type LogResolution,
  type TemperatureColumnMapping,
  type TemperatureCsvInspection,
  type TemperatureUnit,
} from './csv-inspection';

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
