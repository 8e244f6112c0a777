import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { BACKEND_DIR, E2E_BASE_URL, E2E_PORT } from './e2e-config';

async function waitForHealth(backend: ChildProcess, log: () => string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (backend.exitCode !== null) {
      throw new Error(`the backend exited with code ${backend.exitCode} before answering:\n${log()}`);
    }
    try {
      const response = await fetch(`${E2E_BASE_URL}/api/health`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`GET /api/health did not answer within ${timeoutMs / 1000} s:\n${log()}`);
}

/** Starts the built backend on a fresh demo database of its own; returns the teardown. */
export async function startBackend(): Promise<() => Promise<void>> {
  const backendMain = join(BACKEND_DIR, 'dist', 'main.js');
  const databaseDir = mkdtempSync(join(tmpdir(), 'thermbay-e2e-'));
  let output = '';
  const backend = spawn(process.execPath, [backendMain], {
    cwd: BACKEND_DIR,
    env: {
      ...process.env,
      PORT: String(E2E_PORT),
      DATABASE_FILE: join(databaseDir, 'thermbay-e2e.sqlite'),
      DEMO_SEED: 'true',
      NODE_ENV: 'test',
      // Every browser test signs in from the same address; the default 10 a minute would refuse
      // the later ones with 429 once the suite grows.
      LOGIN_RATE_LIMIT_PER_MINUTE: '1000',
      // the in-process SMTP server on any free port; links in e-mails point at this test server
      SMTP_LOCAL_PORT: '0',
      SMTP_URL: '',
      PUBLIC_URL: E2E_BASE_URL,
      // always SQLite here, whatever database the developer's shell points at
      DATABASE_URL: '',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const collect = (chunk: Buffer) => {
    output = (output + chunk.toString()).slice(-20_000);
  };
  backend.stdout?.on('data', collect);
  backend.stderr?.on('data', collect);

  const teardown = async () => {
    if (backend.exitCode === null) {
      const exited = new Promise<void>((resolve) => backend.once('exit', () => resolve()));
      backend.kill('SIGTERM');
      const forceKill = setTimeout(() => backend.kill('SIGKILL'), 5_000);
      await exited;
      clearTimeout(forceKill);
    }
    rmSync(databaseDir, { recursive: true, force: true });
  };

  try {
    await waitForHealth(backend, () => output, 60_000);
  } catch (error) {
    await teardown();
    throw error;
  }
  return teardown;
}
