// `npm start` (run from the repository root): builds what the app needs and serves it, printing how long each step took.
// Two lanes run side by side from the start: the engine then the backend (the backend compiles against
// the engine's declarations), and the frontend production build (it reads the engine's vocabulary from
// source, so it needs no engine build). Then the built API starts and serves the built frontend.
// The builds here only emit: the type-checks are not part of starting (lint, `npm run typecheck` and
// `npm test` run them). `tsc --noCheck` emits the same files as a checked build, only sooner.
import { spawn } from 'node:child_process';

const launched = Date.now();
const seconds = (ms) => (ms / 1000).toFixed(1);

function run(label, args) {
  const started = Date.now();
  return new Promise((resolve, reject) => {
    const child = spawn('npm', args, { stdio: 'inherit' });
    child.on('error', reject);
    child.on('exit', (code) => {
      if (code !== 0) return reject(new Error(`${label} failed (exit code ${code})`));
      console.log(
        `[start] ${label}: ${seconds(Date.now() - started)} s (${seconds(Date.now() - launched)} s since npm start)`,
      );
      resolve();
    });
  });
}

try {
  await Promise.all([
    run('engine build', ['run', 'build:app', '-w', '@thermbay/engine']).then(() =>
      run('backend build', ['run', 'build:app', '-w', '@thermbay/backend']),
    ),
    run('frontend production build', ['run', 'build:app', '-w', '@thermbay/frontend']),
  ]);
  console.log(`[start] built in ${seconds(Date.now() - launched)} s; starting the API`);
  const server = spawn('npm', ['run', 'start:prod', '-w', '@thermbay/backend'], { stdio: 'inherit' });
  for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
  server.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
} catch (error) {
  console.error(`[start] ${error.message}`);
  process.exit(1);
}
