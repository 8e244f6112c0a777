import {
  inspectTemperatureCsv,
  parseTemperatureCsv,
  TemperatureLogError,
  type LogProblem,
  type ParsedTemperatureLog,
  type TemperatureColumnMapping,
  type TemperatureCsvInspection,
} from './temperature-log-csv';

/**
 * Runs in a worker thread (see TemperatureCsvWorkers): reading a 5 MB file takes long enough
 * to stall every other request if it ran on the main thread. A file's problems cross the
 * thread boundary as data (an Error loses its class on the way) and become a
 * TemperatureLogError again on the other side.
 */
export type WorkerOutcome<T> = { ok: true; value: T } | { ok: false; errors: LogProblem[]; moreErrorCount: number };

function outcome<T>(work: () => T): WorkerOutcome<T> {
  try {
    return { ok: true, value: work() };
  } catch (error) {
    if (error instanceof TemperatureLogError)
      return { ok: false, errors: error.errors, moreErrorCount: error.moreErrorCount };
    throw error;
  }
}

export function inspect(task: { bytes: Uint8Array }): WorkerOutcome<TemperatureCsvInspection> {
  return outcome(() => inspectTemperatureCsv(task.bytes));
}

/**
 * A parsed log as it leaves the worker: the readings already written as JSON text. Handing over
 * one string is a copy; handing over 200,000 reading objects would make the main thread rebuild
 * them (and then write them out as JSON again) — hundreds of milliseconds with every other
 * request waiting.
 */
export type ParsedTemperatureLogText = Omit<ParsedTemperatureLog, 'readings'> & {
  readingCount: number;
  readingsJson: string;
};

export function parse(task: {
  bytes: Uint8Array;
  mapping: TemperatureColumnMapping;
}): WorkerOutcome<ParsedTemperatureLogText> {
  return outcome(() => {
    const { readings, ...summary } = parseTemperatureCsv(task.bytes, task.mapping);
    return { ...summary, readingCount: readings.length, readingsJson: JSON.stringify(readings) };
  });
}
