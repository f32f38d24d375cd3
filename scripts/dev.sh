#!/usr/bin/env bash
# npm run dev: next dev with hot reload, on the project-local PostgreSQL and mail sink.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1
bash scripts/ensure-deps.sh
bash scripts/db.sh start
sink_pid=$(bash scripts/mail-sink.sh)
worker_pid=
trap 'kill $worker_pid $sink_pid 2>/dev/null || true' EXIT INT TERM
npx tsx scripts/migrate.ts up
npx tsx scripts/seed.ts
bash scripts/build-engine-worker.sh
# The job worker runs the built bundle: after changing lib/jobs, restart npm run dev.
node .data/worker.mjs &
worker_pid=$!
# next dev listens on loopback only (-H), so the local inbox may be shown.
LEEWAY_LISTEN_HOST=127.0.0.1 npx next dev -H 127.0.0.1 -p "${PORT:-3000}"
