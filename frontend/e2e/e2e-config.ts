import { fileURLToPath } from 'node:url';

/** Set E2E_PORT to run two browser-test runs side by side on one machine. */
export const E2E_PORT = Number(process.env.E2E_PORT ?? 3987);
export const E2E_BASE_URL = `http://127.0.0.1:${E2E_PORT}`;
export const CHROMIUM_PATH = '/usr/bin/chromium';
export const CHROMIUM_INSTALL_COMMAND =
  'apt-get update && DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends chromium fonts-liberation';
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

export const FRONTEND_DIR = fileURLToPath(new URL('..', import.meta.url));
export const BACKEND_DIR = fileURLToPath(new URL('../../backend', import.meta.url));
export const ARTIFACTS_DIR = fileURLToPath(new URL('./artifacts', import.meta.url));

export const DEMO_GROWER = { email: 'grower@example.com', password: 'thermbay-demo' };
