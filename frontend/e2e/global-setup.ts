import { existsSync } from 'node:fs';
import { join } from 'node:path';
import {
  BACKEND_DIR,
  CHROMIUM_INSTALL_COMMAND,
  CHROMIUM_PATH,
  E2E_BASE_URL,
  E2E_PORT,
  FRONTEND_DIR,
} from './e2e-config';

/**
 * Checks once that the browser and both builds are there and the port is free. Each test file
 * then starts its own backend on a fresh demo database (backend-per-file.ts), so that no file sees
 * what another one saved.
 */
export default async function setup(): Promise<void> {
  if (!existsSync(CHROMIUM_PATH)) {
    throw new Error(`${CHROMIUM_PATH} is missing. Install Debian's chromium once:\n  ${CHROMIUM_INSTALL_COMMAND}`);
  }
  const backendMain = join(BACKEND_DIR, 'dist', 'main.js');
  if (!existsSync(backendMain)) {
    throw new Error(`${backendMain} is missing: run \`npm run build -w @thermbay/backend\` first.`);
  }
  if (!existsSync(join(FRONTEND_DIR, 'dist', 'index.html'))) {
    throw new Error('frontend/dist is missing: run `npm run build -w @thermbay/frontend` first.');
  }

  if (
    await fetch(`${E2E_BASE_URL}/api/health`).then(
      () => true,
      () => false,
    )
  ) {
    throw new Error(`port ${E2E_PORT} is already answering; stop that server or set E2E_PORT to a free port`);
  }
}
