#!/usr/bin/env bash
# `npm test`: every test there is — backend unit and e2e (jest), frontend components (vitest),
# and the browser tests (playwright-core + Debian's chromium) against the built app.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-chromium.sh
echo "== build (the browser tests run the built app)"
npm run build
echo "== backend: unit and e2e"
npm run test -w backend
echo "== frontend: components"
npm run test -w frontend
echo "== browser"
npm run test:e2e -w frontend
echo "all test suites passed"
