// `npm start` (run from the repository root): builds what the app needs and serves it, printing how long each step took.
// The engine is built first (the backend compiles against it); then the backend and the frontend
// build side by side; then the built API starts and serves the built frontend.
// The frontend's type-check is not part of starting (lint and `npm test` run it).
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
  await run('engine build', ['run', 'build', '-w', '@thermbay/engine']);
  await Promise.all([
    run('backend build', ['run', 'build:app', '-w', '@thermbay/backend']),
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
