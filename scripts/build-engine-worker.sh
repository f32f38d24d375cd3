#!/usr/bin/env bash
# Bundles the engine's worker-thread entry into .data/engine-worker.mjs (loaded by lib/engine/pool.ts).
set -euo pipefail
cd "$(dirname "$0")/.."
mkdir -p .data
npx esbuild lattice/worker-entry.ts --bundle --platform=node --format=esm --target=node20 --outfile=.data/engine-worker.mjs --log-level=warning
