#!/usr/bin/env bash
# npm start: on a fresh machine, installs packages, starts PostgreSQL and the mail sink,
# migrates, seeds the invented demo data (local database only), builds when needed and serves
# the app on http://127.0.0.1:${PORT:-3000}, with one job worker beside it (npm run worker).
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1
PORT=${PORT:-3000}
HOST=${HOST:-127.0.0.1}
export APP_URL=${APP_URL:-http://$HOST:$PORT}
mkdir -p .data

bash scripts/ensure-deps.sh
bash scripts/db.sh start
sink_pid=$(bash scripts/mail-sink.sh)
worker_pid=
next_pid=
# SIGTERM or Ctrl-C: the server and the worker get their own SIGTERM and up to 10 s to finish.
cleanup() {
  for pid in $next_pid $worker_pid; do kill -TERM "$pid" 2>/dev/null || true; done
  for pid in $next_pid $worker_pid; do wait "$pid" 2>/dev/null || true; done
  [ -n "$sink_pid" ] && kill "$sink_pid" 2>/dev/null || true
}
trap cleanup EXIT
trap 'exit 143' INT TERM
npx tsx scripts/migrate.ts up
npx tsx scripts/seed.ts
bash scripts/build-if-needed.sh

cat <<TXT

  Leeway is running at $APP_URL
  Demo sign-ins (invented organisations; password leeway-demo-2026, for local use only):
    admin@kestrelbay.example      admin
    analyst@kestrelbay.example    analyst
    reviewer@kestrelbay.example   reviewer
    executive@kestrelbay.example  executive (read-only)
    owner@harrowfen.example       admin of a second, unrelated organisation
  E-mail goes to the local inbox, open only from this machine: $APP_URL/inbox

TXT
node .data/worker.mjs &
worker_pid=$!
HOST=$HOST PORT=$PORT node .data/serve.mjs &
next_pid=$!
wait "$next_pid"
