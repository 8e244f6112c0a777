#!/usr/bin/env bash
# `npm test`: lint and format, type-checks (specs included), then every test there is — the
# engine's specs, backend unit and e2e (jest), frontend components (vitest), and the browser tests
# (playwright-core + Debian's chromium) against the built app.
set -euo pipefail
cd "$(dirname "$0")/.."
bash .ci/ensure-chromium.sh
echo "== lint and format"
npm run lint
echo "== type-check (backend specs and engine included)"
npm run typecheck -w @thermbay/backend
echo "== build (the browser tests run the built app)"
npm run build
echo "== engine"
npm run test -w @thermbay/engine
echo "== backend: unit and e2e"
npm run test -w @thermbay/backend
echo "== frontend: components"
npm run test -w @thermbay/frontend
echo "== browser"
npm run test:e2e -w @thermbay/frontend
echo "all test suites passed"
