import { afterAll, beforeAll } from 'vitest';
import { startBackend } from './backend-process';

/**
 * Runs before every browser test file: a backend of its own on a fresh demo database, stopped
 * (and its database deleted) when the file is done. Files run one after another on E2E_PORT.
 */
let stopBackend: (() => Promise<void>) | undefined;

beforeAll(async () => {
  stopBackend = await startBackend();
}, 120_000);

afterAll(async () => {
  await stopBackend?.();
}, 30_000);
