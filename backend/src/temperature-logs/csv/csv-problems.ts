// Limits of a temperature file and how its problems are reported, line by line.
import { EngineInputError } from '@thermbay/engine/errors';
import { TEMPERATURE_LOG_LIMITS } from '@thermbay/engine/vocabulary';

/** Largest file the API accepts, bytes. */
export const TEMPERATURE_LOG_MAX_BYTES = TEMPERATURE_LOG_LIMITS.maxBytes;
/** Most data rows the API reads from one file. */
export const TEMPERATURE_LOG_MAX_ROWS = TEMPERATURE_LOG_LIMITS.maxRows;
/** Errors listed one by one; the rest are only counted. */
export const MAX_LISTED_ERRORS = 20;
/** Data rows shown back to the user when proposing columns. */
export const SAMPLE_ROW_COUNT = 10;

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
export class ProblemList {
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

export function refuseTooManyRows(dataRowCount: number): void {
  if (dataRowCount > TEMPERATURE_LOG_MAX_ROWS) {
    fail(
      null,
      `the file has ${dataRowCount.toLocaleString('en-US')} data rows; at most ${TEMPERATURE_LOG_MAX_ROWS.toLocaleString('en-US')} are read at once, so split the log into shorter periods`,
    );
  }
}

export function fail(line: number | null, message: string): never {
  throw new TemperatureLogError([{ line, message }]);
}
