#!/usr/bin/env bash
# npm test: on a fresh machine, installs what the tests need (npm packages, PostgreSQL, Debian's
# Chromium), then runs every check a change must pass, stopping at the first failure.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1
mkdir -p .data

step() { echo; echo "━━ $*"; }

step "install"
bash scripts/ensure-deps.sh
bash scripts/ensure-debian-tools.sh
bash scripts/db.sh start

step "db.sh survives restarts and kills"
bash tests/scripts/db-script.sh

step "type-check, lint, format"
npx tsc --noEmit
npx eslint . --max-warnings 0
npx prettier --check . --log-level warn

step "engine and unit tests"
npx vitest run --project lattice --project unit

step "database integration tests (real PostgreSQL, fresh test database)"
npx vitest run --project db

step "build"
bash scripts/build-if-needed.sh

step "end-to-end tests (Chromium, the built app, its own database and mail sink)"
npx vitest run --project e2e

step "faults: SIGKILL of a worker and of PostgreSQL, SIGTERM, oversized work (npm run faults)"
npx tsx scripts/faults.ts
