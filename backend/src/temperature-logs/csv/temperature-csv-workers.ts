import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { Piscina } from 'piscina';
import {
  TemperatureLogError,
  type TemperatureColumnMapping,
  type TemperatureCsvInspection,
} from './temperature-log-csv';
import type { ParsedTemperatureLogText, WorkerOutcome } from './temperature-log-csv.worker';

/**
 * The compiled worker beside this file in dist/; when the app runs from its TypeScript sources
 * (the e2e specs, through ts-jest) a small JavaScript entry compiles the worker on the fly.
 */
function workerFile(): string {
  const compiled = join(__dirname, 'temperature-log-csv.worker.js');
  if (__filename.endsWith('.js') && existsSync(compiled)) return compiled;
  return join(__dirname, 'temperature-log-csv.worker-from-source.js');
}

/**
 * Reads uploaded temperature files in worker threads, so that a large file never holds up the
 * event loop (and with it every other request). Threads start on the first upload and stop
 * after a minute without work.
 */
@Injectable()
export class TemperatureCsvWorkers implements OnModuleDestroy {
  private readonly pool = new Piscina({
    filename: workerFile(),
    minThreads: 0,
    maxThreads: Math.max(1, Math.min(2, availableParallelism() - 1)),
    idleTimeout: 60_000,
  });

  async inspect(bytes: Uint8Array): Promise<TemperatureCsvInspection> {
    return unwrap(await this.pool.run({ bytes }, { name: 'inspect' }));
  }

  /** Every row read with the confirmed mapping; the readings come back as JSON text, ready to store. */
  async parse(bytes: Uint8Array, mapping: TemperatureColumnMapping): Promise<ParsedTemperatureLogText> {
    return unwrap(await this.pool.run({ bytes, mapping }, { name: 'parse' }));
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool.destroy();
  }
}

function unwrap<T>(outcome: WorkerOutcome<T>): T {
  if (outcome.ok) return outcome.value;
  throw new TemperatureLogError(outcome.errors, outcome.moreErrorCount);
}
