/**
 * Speed of the API (run: npm run bench:http). Prints figures; asserts nothing.
 *
 * Starts the built app (dist/main.js) as a child process on a throwaway SQLite file, its own port
 * (BENCH_PORT, default 3901), the demo seed on and the sign-in limit lifted, then drives it with
 * autocannon: BENCH_CONNECTIONS (default 50) connections for BENCH_SECONDS (default 5) seconds per
 * route (the 50-house budget: BENCH_BUDGET_CONNECTIONS, default 4). For each route it prints requests/s, p50 and p99 latency and the server's resident memory
 * (VmRSS from /proc/<pid>/status after the route, and the peak VmHWM) and the server's CPU time per
 * request (from /proc/<pid>/stat: less disturbed than requests/s when other work shares the machine). The farm budget is also timed
 * one request at a time, since its aim is the time of one budget. The whole run is bounded
 * (BENCH_DEADLINE_SECONDS, default 300): past it, the server is stopped and the script exits non-zero.
 *
 * The server runs with the node flags of package.json's start:prod, as `npm start` serves it.
 * Last, the framework alone (framework-floor-app.ts) serves the same estimate answer under the same load:
 * the most NestJS on Express allows on this machine, printed beside the real routes.
 * BENCH_CPU_PROF=<folder> starts the server under `node --cpu-prof` and writes its profile there on exit.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

// autocannon ships no types; this is the part of its API the bench uses.
interface AutocannonResult {
  requests: { average: number; total: number };
  latency: { p50: number; p99: number; average: number; max: number };
  non2xx: number;
  errors: number;
  timeouts: number;
  throughput: { average: number };
}
type Autocannon = (options: {
  url: string;
  method?: string;
  headers?: Record<string, string>;
  body?: string;
  connections?: number;
  duration?: number;
  pipelining?: number;
}) => Promise<AutocannonResult>;
// eslint-disable-next-line @typescript-eslint/no-require-imports
const autocannon = require('autocannon') as Autocannon;

const PORT = Number(process.env.BENCH_PORT ?? 3901);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 5);
const DEADLINE_S = Number(process.env.BENCH_DEADLINE_SECONDS ?? 300);
const FARM_HOUSES = 50;
/** BENCH_ONLY=estimate,me runs only those routes (health, me, estimate, season, budget, floor: the framework alone), e.g. for a profile. */
const ONLY = (process.env.BENCH_ONLY ?? '').split(',').filter(Boolean);
/** A budget takes a tenth of a second or more: under 50 connections each would wait seconds in the queue. */
const BUDGET_CONNECTIONS = Number(process.env.BENCH_BUDGET_CONNECTIONS ?? 4);
const BASE = `http://127.0.0.1:${PORT}`;

const HOUSE = {
  shape: 'gable',
  spans: 1,
  widthM: 9,
  lengthM: 30,
  eaveHeightM: 2.5,
  ridgeHeightM: 4.5,
  coverings: { roof: 'poly-double-inflated', sidewalls: 'poly-double-inflated', endwalls: 'polycarbonate-twin-8mm' },
  airLeakageClassId: 'new-film-double',
  perimeterInsulated: false,
  curtainId: null,
  heaters: [{ count: 2, ratedInputW: 50_000, efficiency: 0.8, fuelId: 'propane' }],
  exhaustFans: { count: 2, capacityEachM3PerS: 5 },
  inletAreaM2: 3,
  setpoints: { dayHeatingC: 18, nightHeatingC: 15, coolingC: 25 },
};
const DESIGN_NIGHT = { designOutdoorC: -20, elevationM: 0, insideRelativeHumidityPct: 80 };
const SEASON = { startDate: '2026-09-01', endDate: '2027-05-31' };

let server: ChildProcess | null = null;
let floorServer: ChildProcess | null = null;
const FLOOR_PORT = PORT + 1;
const databaseFile = join(tmpdir(), `thermbay-bench-${process.pid}-${Date.now()}.sqlite`);

function memoryMb(pid: number): { rssMb: number; peakMb: number } {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = (key: string) => Number(new RegExp(`^${key}:\\s+(\\d+) kB`, 'm').exec(status)?.[1] ?? NaN);
  return { rssMb: kb('VmRSS') / 1024, peakMb: kb('VmHWM') / 1024 };
}

/** CPU time the server process has used so far (all its threads), in ms, from /proc/<pid>/stat. */
function cpuMs(pid: number): number {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
  // fields[11] and [12] are utime and stime (the 14th and 15th of the line) in clock ticks, 100 per second
  return (Number(fields[11]) + Number(fields[12])) * 10;
}

async function api<T>(
  method: string,
  path: string,
  token: string | null,
  body?: unknown,
  version?: number,
): Promise<T> {
  const response = await fetch(BASE + path, {
    method,
    headers: {
      'content-type': 'application/json',
      ...(token ? { authorization: `Bearer ${token}` } : {}),
      ...(version === undefined ? {} : { 'if-match': String(version) }),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await response.text();
  if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${text.slice(0, 300)}`);
  return (text ? JSON.parse(text) : null) as T;
}

async function waitForHealth(child: ChildProcess, base = BASE): Promise<number> {
  const start = Date.now();
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the server exited with code ${child.exitCode} before answering`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) return Date.now() - start;
    } catch {
      // not listening yet
    }
    if (Date.now() - start > 60_000) throw new Error('no /api/health within 60 s');
    await new Promise((done) => setTimeout(done, 100));
  }
}

async function stopServer(): Promise<void> {
  await stopChild(floorServer);
  floorServer = null;
  await stopChild(server);
  server = null;
}

async function stopChild(child: ChildProcess | null): Promise<void> {
  if (!child || child.exitCode !== null) return;
  const exited = new Promise<void>((done) => child.once('exit', () => done()));
  child.kill('SIGTERM');
  const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
  await exited;
  clearTimeout(timer);
}

function cleanUp(): void {
  for (const suffix of ['', '-wal', '-shm', '-journal']) rmSync(databaseFile + suffix, { force: true });
  rmSync(floorAnswerFile, { force: true });
}

const floorAnswerFile = join(tmpdir(), `thermbay-bench-answer-${process.pid}-${Date.now()}.json`);

/**
 * The framework alone (framework-floor-app.ts) answering health and, with the real app's own
 * estimate answer, the estimate route, under the same load: what NestJS on Express allows here.
 */
async function frameworkFloor(estimateAnswer: string, estimateBody: unknown): Promise<Row[]> {
  writeFileSync(floorAnswerFile, estimateAnswer);
  floorServer = spawn(process.execPath, [...productionNodeFlags(), resolve(__dirname, 'framework-floor-app.js')], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      BENCH_FLOOR_PORT: String(FLOOR_PORT),
      BENCH_FLOOR_ANSWER: floorAnswerFile,
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const pid = floorServer.pid!;
  const base = `http://127.0.0.1:${FLOOR_PORT}`;
  await waitForHealth(floorServer, base);
  return [
    await load(pid, 'framework alone: GET /api/health', 'GET', '/api/health', null, undefined, CONNECTIONS, base),
    await load(
      pid,
      'framework alone: POST same estimate answer',
      'POST',
      '/api/estimates',
      null,
      estimateBody,
      CONNECTIONS,
      base,
    ),
  ];
}

interface Row {
  route: string;
  rps: number;
  p50: number;
  p99: number;
  rssMb: number;
  peakMb: number;
  cpuMsPerRequest: number;
  note: string;
}

async function load(
  pid: number,
  route: string,
  method: string,
  path: string,
  token: string | null,
  body?: unknown,
  connections = CONNECTIONS,
  base = BASE,
): Promise<Row> {
  const cpuBefore = cpuMs(pid);
  const result = await autocannon({
    url: base + path,
    method,
    connections,
    duration: SECONDS,
    headers: {
      'content-type': 'application/json',
      ...(token ? { authorization: `Bearer ${token}` } : {}),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const failures = result.non2xx + result.errors + result.timeouts;
  return {
    route,
    rps: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    ...memoryMb(pid),
    cpuMsPerRequest: (cpuMs(pid) - cpuBefore) / Math.max(1, result.requests.total),
    note: `${connections} conn., ${result.requests.total} requests${failures ? `, ${failures} failed` : ''}, ${(result.throughput.average / 1024).toFixed(0)} kB/s`,
  };
}

/** The node flags of package.json's start:prod (`node --flag … dist/main.js`). */
function productionNodeFlags(): string[] {
  const manifest = JSON.parse(readFileSync(resolve(__dirname, '..', '..', 'package.json'), 'utf8')) as {
    scripts: Record<string, string>;
  };
  const words = manifest.scripts['start:prod'].trim().split(/\s+/);
  return words.slice(words.indexOf('node') + 1).filter((word) => word.startsWith('--'));
}

async function main(): Promise<void> {
  const main = resolve(__dirname, '..', 'main.js');
  const profileDir = process.env.BENCH_CPU_PROF;
  const nodeArgs = [
    ...productionNodeFlags(),
    ...(profileDir ? ['--cpu-prof', `--cpu-prof-dir=${resolve(profileDir)}`] : []),
  ];
  server = spawn(process.execPath, [...nodeArgs, main], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(PORT),
      DATABASE_FILE: databaseFile,
      DEMO_SEED: 'true',
      LOGIN_RATE_LIMIT_PER_MINUTE: '10000',
      JWT_SECRET: randomBytes(24).toString('hex'),
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const pid = server.pid!;
  const bootMs = await waitForHealth(server);
  const idle = memoryMb(pid);
  console.log(
    `server pid ${pid} (node ${nodeArgs.join(' ') || 'without flags'}) up in ${bootMs} ms on port ${PORT}; ` +
      `RSS at rest ${idle.rssMb.toFixed(0)} MB; ${CONNECTIONS} connections × ${SECONDS} s per route`,
  );

  const session = await api<{ accessToken: string }>('POST', '/api/auth/login', null, {
    email: 'grower@example.com',
    password: 'thermbay-demo',
  });
  const token = session.accessToken;
  const farms = await api<{ id: number }[]>('GET', '/api/farms', token);
  const demoFarmId = farms[0].id;
  const demoHouses = await api<{ id: number }[]>('GET', `/api/farms/${demoFarmId}/houses`, token);
  const climate = await api<{ climate: unknown }>('GET', `/api/farms/${demoFarmId}/climate`, token);
  const prices = await api<{ prices: { fuelId: string; pricePerUnit: number; priceUnit: string }[] }>(
    'GET',
    `/api/farms/${demoFarmId}/fuel-prices`,
    token,
  );

  const wantBudget = ONLY.length === 0 || ONLY.includes('budget');
  // A generated farm of 50 houses on the demo farm's site, climate and prices, built through the API.
  const farm = { id: 0 };
  if (wantBudget) {
    farm.id = (
      await api<{ id: number }>('POST', '/api/farms', token, {
        name: 'Bench farm (generated)',
        latitudeDeg: 40.1,
        longitudeDeg: -83,
        elevationM: 250,
        timeZone: 'America/New_York',
      })
    ).id;
    // Versioned writes name the version they were based on; a new farm's rows start at the version the API reports.
    const climateNow = await api<{ version: number }>('GET', `/api/farms/${farm.id}/climate`, token);
    await api('PUT', `/api/farms/${farm.id}/climate`, token, climate.climate, climateNow.version);
    const pricesNow = await api<{ version: number }>('GET', `/api/farms/${farm.id}/fuel-prices`, token);
    await api(
      'PUT',
      `/api/farms/${farm.id}/fuel-prices`,
      token,
      { prices: prices.prices.map(({ fuelId, pricePerUnit, priceUnit }) => ({ fuelId, pricePerUnit, priceUnit })) },
      pricesNow.version,
    );
    for (let index = 0; index < FARM_HOUSES; index++) {
      await api('POST', `/api/farms/${farm.id}/houses`, token, {
        ...HOUSE,
        name: `Bench house ${index + 1}`,
        widthM: 7 + (index % 6),
        lengthM: 24 + 2 * (index % 10),
      });
    }
  }

  const estimateBody = { house: HOUSE, conditions: DESIGN_NIGHT };
  const routes: [string, () => Promise<Row>][] = [
    ['health', () => load(pid, 'GET /api/health', 'GET', '/api/health', null)],
    ['me', () => load(pid, 'GET /api/auth/me (signed in)', 'GET', '/api/auth/me', token)],
    ['estimate', () => load(pid, 'POST /api/estimates (design night)', 'POST', '/api/estimates', token, estimateBody)],
    [
      'season',
      () => load(pid, 'POST /api/houses/:id/season', 'POST', `/api/houses/${demoHouses[0].id}/season`, token, SEASON),
    ],
    [
      'budget',
      () =>
        load(
          pid,
          `POST /api/farms/:id/season-budget (${FARM_HOUSES} houses)`,
          'POST',
          `/api/farms/${farm.id}/season-budget`,
          token,
          SEASON,
          BUDGET_CONNECTIONS,
        ),
    ],
  ];
  const rows: Row[] = [];
  for (const [key, run] of routes) if (ONLY.length === 0 || ONLY.includes(key)) rows.push(await run());

  // One budget at a time: the time a user waits for it.
  await new Promise((done) => setTimeout(done, 1000)); // let the server finish what autocannon left in flight
  const times: number[] = [];
  for (let run = 0; wantBudget && run < 7; run++) {
    const start = process.hrtime.bigint();
    await api('POST', `/api/farms/${farm.id}/season-budget`, token, SEASON);
    times.push(Number(process.hrtime.bigint() - start) / 1e6);
  }
  times.sort((a, b) => a - b);
  const memory = memoryMb(pid);

  const wantFloor = ONLY.length === 0 || ONLY.includes('floor');
  if (wantFloor) {
    const answer = await api<unknown>('POST', '/api/estimates', token, estimateBody);
    rows.push(...(await frameworkFloor(JSON.stringify(answer), estimateBody)));
  }

  const pad = (text: string, width: number) => text.padEnd(width);
  const num = (value: number, width: number, digits = 0) => value.toFixed(digits).padStart(width);
  console.log('');
  console.log(
    `${pad('route', 46)} ${'req/s'.padStart(8)} ${'p50 ms'.padStart(7)} ${'p99 ms'.padStart(7)} ${'RSS MB'.padStart(7)} ${'peak MB'.padStart(8)} ${'CPU ms/req'.padStart(10)}  notes`,
  );
  for (const row of rows) {
    console.log(
      `${pad(row.route, 46)} ${num(row.rps, 8)} ${num(row.p50, 7)} ${num(row.p99, 7)} ${num(row.rssMb, 7)} ${num(row.peakMb, 8)} ${num(row.cpuMsPerRequest, 10, 2)}  ${row.note}`,
    );
  }
  const health = rows.find((row) => row.route === 'GET /api/health');
  const estimate = rows.find((row) => row.route.startsWith('POST /api/estimates'));
  const floor = rows.find((row) => row.route.startsWith('framework alone: POST'));
  console.log('');
  if (health && estimate) {
    console.log(`design estimate ÷ health requests/s: ${(estimate.rps / health.rps).toFixed(2)} (aim ≥ 0.60)`);
  }
  if (estimate) console.log(`design estimate p99: ${estimate.p99} ms (aim < 50 ms)`);
  if (estimate && floor)
    console.log(
      `the framework alone, same answer: ${floor.rps.toFixed(0)} req/s, p99 ${floor.p99} ms; ` +
        `the design estimate reaches ${((estimate.rps / floor.rps) * 100).toFixed(0)} % of its requests/s`,
    );
  if (wantBudget)
    console.log(
      `${FARM_HOUSES}-house budget, one request at a time (7 runs): median ${times[3].toFixed(0)} ms, ` +
        `slowest ${times[6].toFixed(0)} ms (aim < 500 ms)`,
    );
  console.log(
    `server resident memory after the routes ${memory.rssMb.toFixed(0)} MB, peak ${memory.peakMb.toFixed(0)} MB (aim < 250 MB)`,
  );
}

const deadline = setTimeout(() => {
  console.error(`bench:http did not finish within ${DEADLINE_S} s; stopping`);
  void stopServer().finally(() => {
    cleanUp();
    process.exit(1);
  });
}, DEADLINE_S * 1000);

main()
  .then(async () => {
    await stopServer();
    cleanUp();
    clearTimeout(deadline);
  })
  .catch(async (error: Error) => {
    console.error(`bench:http failed: ${error.message}`);
    await stopServer();
    cleanUp();
    clearTimeout(deadline);
    process.exitCode = 1;
  });
