#!/usr/bin/env bash
# Bundles the production server (.data/serve.mjs), the job worker (.data/worker.mjs) and the worker-thread entries: the engine (.data/engine-worker.mjs, loaded by
# lib/engine/pool.ts), the board pack renderer (.data/board-pack-worker.mjs, loaded by
# lib/board-pack/store.ts), the validation report's (.data/validation-report-worker.mjs) and the Monte Carlo volatility estimate (.data/simulation-worker.mjs,
# loaded by lib/jobs/run-simulation.ts in the job worker), the cross-check (.data/cross-check-worker.mjs,
# loaded by lib/jobs/run-cross-check.ts) and the upload reader (.data/upload-worker.mjs, loaded by
# lib/uploads/read-in-thread.ts), so CPU-bound work never runs on a request's event loop.
set -euo pipefail
cd "$(dirname "$0")/.."
mkdir -p .data
npx esbuild lattice/worker-entry.ts --bundle --platform=node --format=esm --target=node20 --outfile=.data/engine-worker.mjs --log-level=warning
# react-pdf's packages stay outside the bundle (they load their own assets at run time); the
# worker imports them from node_modules like the app does.
npx esbuild lib/board-pack/worker-entry.ts --bundle --platform=node --format=esm --target=node20 --jsx=automatic --alias:@=. \
  --external:@react-pdf/renderer --external:react --outfile=.data/board-pack-worker.mjs --log-level=warning
npx esbuild lib/validation-report/worker-entry.ts --bundle --platform=node --format=esm --target=node20 --jsx=automatic --alias:@=. \
  --external:@react-pdf/renderer --external:react --outfile=.data/validation-report-worker.mjs --log-level=warning
# The production server (scripts/serve.ts): Next.js and compression (CommonJS) stay outside the bundle.
npx esbuild scripts/serve.ts --bundle --platform=node --format=esm --target=node20 --alias:@=. --external:next --external:compression \
  --outfile=.data/serve.mjs --log-level=warning
npx esbuild lib/volatility/simulation-worker-entry.ts --bundle --platform=node --format=esm --target=node20 --alias:@=. \
  --outfile=.data/simulation-worker.mjs --log-level=warning
# Uploaded workbooks and series are read in a thread too (lib/uploads/read-in-thread.ts);
# exceljs (CommonJS, requiring Node's own modules) loads from node_modules.
npx esbuild lib/uploads/worker-entry.ts --bundle --platform=node --format=esm --target=node20 --alias:@=. --external:exceljs \
  --outfile=.data/upload-worker.mjs --log-level=warning
npx esbuild lib/cross-check/worker-entry.ts --bundle --platform=node --format=esm --target=node20 --alias:@=. \
  --outfile=.data/cross-check-worker.mjs --log-level=warning
# The job worker (scripts/worker.ts): packages stay in node_modules, except server-only's guard,
# which is given its server entry (the worker is server code, like the modules it shares with the app).
npx esbuild scripts/worker.ts --bundle --platform=node --format=esm --target=node20 --alias:@=. --packages=external \
  --alias:server-only=./node_modules/server-only/empty.js \
  --outfile=.data/worker.mjs --log-level=warning
# The engine's published-value checks, valued from the tests' own tables for the validation report.
node --import tsx scripts/reference-results.ts
