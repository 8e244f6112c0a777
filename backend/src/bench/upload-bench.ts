/**
 * Does a large temperature upload hold up other requests? (run: npm run bench:upload -w
 * @thermbay/backend, or as part of npm run bench). Prints figures; asserts nothing.
 *
 * Boots the built app on a throwaway SQLite file, then hammers GET /api/health with autocannon
 * (a separate process, 10 connections) twice: once idle, and once while a 5 MB hourly
 * temperature CSV of short rows is inspected and uploaded again and again. It prints the health
 * latency percentiles of both runs and the server's event-loop delay during the uploads.
 */
import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { rmSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { TEMPERATURE_LOG_LIMITS } from '@thermbay/engine/vocabulary';

const SECONDS = 20;
const pad = (value: number) => String(value).padStart(2, '0');

/** An hourly log of short rows (time, temperature, humidity), as many as fit in the size and row limits. */
function fiveMegabyteCsv(): Buffer {
  const lines = ['time,temp,rh'];
  let bytes = lines[0].length + 1;
  const start = Date.UTC(2000, 0, 1);
  for (let hour = 0; hour < TEMPERATURE_LOG_LIMITS.maxRows; hour++) {
    const at = new Date(start + hour * 3_600_000);
    const line = `${at.getUTCFullYear()}-${pad(at.getUTCMonth() + 1)}-${pad(at.getUTCDate())} ${pad(at.getUTCHours())}:00,${(((hour * 37) % 300) / 10 - 10).toFixed(1)},80.0`;
    if (bytes + line.length + 1 > TEMPERATURE_LOG_LIMITS.maxBytes) break;
    lines.push(line);
    bytes += line.length + 1;
  }
  return Buffer.from(lines.join('\n') + '\n');
}

interface Latency {
  p50: number;
  p99: number;
  max: number;
  requests: number;
}

/** autocannon in its own process, so the load generator does not share the server's event loop. */
function hammerHealth(url: string): Promise<Latency> {
  return new Promise((resolvePromise, reject) => {
    const child = spawn(
      process.execPath,
      [require.resolve('autocannon/autocannon.js'), '-j', '-c', '10', '-d', String(SECONDS), url],
      { stdio: ['ignore', 'pipe', 'ignore'] },
    );
    let out = '';
    child.stdout.on('data', (chunk: Buffer) => (out += chunk.toString()));
    child.on('error', reject);
    child.on('close', () => {
      try {
        const result = JSON.parse(out) as {
          latency: { p50: number; p99: number; max: number };
          requests: { total: number };
        };
        resolvePromise({ ...result.latency, requests: result.requests.total });
      } catch (error) {
        reject(error as Error);
      }
    });
  });
}

/** The uploading process: inspect and upload the 5 MB file again and again, printing each round's ms. */
async function uploadClient(base: string, accessToken: string, farmId: string): Promise<void> {
  const csv = fiveMegabyteCsv();
  const auth = { authorization: `Bearer ${accessToken}` };
  let stop = false;
  process.on('SIGTERM', () => (stop = true));
  await new Promise((r) => setTimeout(r, 500));
  for (let round = 0; !stop; round++) {
    const started = performance.now();
    const form = new FormData();
    form.append('file', new Blob([csv], { type: 'text/csv' }), 'log.csv');
    const inspected = await fetch(`${base}/api/farms/${farmId}/temperature-logs/inspect`, {
      method: 'POST',
      headers: auth,
      body: form,
    });
    if (inspected.status !== 200) throw new Error(`inspect answered ${inspected.status}`);
    const upload = new FormData();
    upload.append('file', new Blob([csv], { type: 'text/csv' }), 'log.csv');
    upload.append('name', `bench ${round}`);
    upload.append('mapping', JSON.stringify({ timestampColumn: 'time', temperatureColumn: 'temp', unit: 'C' }));
    const stored = await fetch(`${base}/api/farms/${farmId}/temperature-logs`, {
      method: 'POST',
      headers: auth,
      body: upload,
    });
    if (stored.status !== 201) throw new Error(`upload answered ${stored.status}: ${await stored.text()}`);
    console.log((performance.now() - started).toFixed(0));
  }
}

async function main(): Promise<void> {
  const databaseFile = join(tmpdir(), `thermbay-upload-bench-${process.pid}.sqlite`);
  Object.assign(process.env, {
    NODE_ENV: 'test',
    DATABASE_FILE: databaseFile,
    DEMO_SEED: 'true',
    JWT_SECRET: randomBytes(32).toString('hex'),
    LOGIN_RATE_LIMIT_PER_MINUTE: '1000',
  });
  const { AppModule } = await import('../app.module');
  const { configureApp } = await import('../app.setup');
  const app = await NestFactory.create(AppModule.forRoot(), { logger: ['error'] });
  configureApp(app);
  await app.listen(0, '127.0.0.1');
  const base = (await app.getUrl()).replace('[::1]', '127.0.0.1');
  try {
    const login = await fetch(`${base}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'grower@example.com', password: 'thermbay-demo' }),
    });
    const { accessToken } = (await login.json()) as { accessToken: string };
    const auth = { authorization: `Bearer ${accessToken}` };
    const farms = (await (await fetch(`${base}/api/farms`, { headers: auth })).json()) as Array<{ id: number }>;
    const farmId = farms[0].id;
    const csv = fiveMegabyteCsv();
    const rows = csv.toString().split('\n').length - 2;

    const idleLag = monitorEventLoopDelay({ resolution: 10 });
    idleLag.enable();
    const idle = await hammerHealth(`${base}/api/health`);
    idleLag.disable();

    const lag = monitorEventLoopDelay({ resolution: 10 });
    // The uploads come from another process too, so that building the multipart bodies does
    // not count against the server's event loop.
    const uploader = spawn(process.execPath, [__filename, 'upload-client', base, accessToken, String(farmId)], {
      stdio: ['ignore', 'pipe', 'inherit'],
    });
    let uploaderOut = '';
    uploader.stdout.on('data', (chunk: Buffer) => (uploaderOut += chunk.toString()));
    const uploaderDone = new Promise<void>((resolvePromise) => uploader.on('close', () => resolvePromise()));
    lag.enable();
    const busy = await hammerHealth(`${base}/api/health`);
    lag.disable();
    // Asked to stop, the uploader finishes its round first, so no upload is cut off mid-way.
    uploader.kill('SIGTERM');
    await uploaderDone;
    const uploadTimes = uploaderOut
      .split('\n')
      .filter((line) => line.trim() !== '')
      .map(Number);
    const uploads = uploadTimes.length;

    const ms = (ns: number) => (ns / 1e6).toFixed(1);
    console.log(`upload bench: ${(csv.length / 1024 / 1024).toFixed(2)} MB, ${rows} hourly rows per file`);
    console.log(
      `  GET /api/health idle          p50 ${idle.p50} ms  p99 ${idle.p99} ms  max ${idle.max} ms  (${idle.requests} requests)`,
    );
    console.log(
      `  GET /api/health during upload p50 ${busy.p50} ms  p99 ${busy.p99} ms  max ${busy.max} ms  (${busy.requests} requests)`,
    );
    console.log(
      `  event-loop delay idle           p50 ${ms(idleLag.percentile(50))} ms  p99 ${ms(idleLag.percentile(99))} ms  max ${ms(idleLag.max)} ms`,
    );
    console.log(
      `  event-loop delay during upload p50 ${ms(lag.percentile(50))} ms  p99 ${ms(lag.percentile(99))} ms  max ${ms(lag.max)} ms`,
    );
    const sorted = [...uploadTimes].sort((a, b) => a - b);
    console.log(
      `  ${uploads} inspect + upload rounds, median ${sorted.length ? sorted[Math.floor(sorted.length / 2)].toFixed(0) : '–'} ms each`,
    );
    console.log(`  aim: health p99 under 50 ms while a 5 MB file is read -> ${busy.p99 < 50 ? 'met' : 'NOT met'}`);
    console.log(
      `  (load average ${loadavg()
        .map((value) => value.toFixed(1))
        .join(' ')} on ${availableParallelism()} cores)`,
    );
  } finally {
    await app.close();
    for (const suffix of ['', '-wal', '-shm']) rmSync(databaseFile + suffix, { force: true });
  }
}

(process.argv[2] === 'upload-client' ? uploadClient(process.argv[3], process.argv[4], process.argv[5]) : main()).catch(
  (error: Error) => {
    console.error(error);
    process.exit(1);
  },
);
