#!/usr/bin/env bash
# Builds the Next.js app when there is no build or a source file changed since the last one.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1
mkdir -p .data
# The engine worker is small and quick to bundle: always bring it up to date.
bash scripts/build-engine-worker.sh
if [ -f .next/BUILD_ID ] && [ -z "$(find app components lib lattice db demo proxy.ts instrumentation.ts next.config.mjs tailwind.config.ts postcss.config.mjs package-lock.json -newer .next/BUILD_ID -print -quit 2>/dev/null)" ]; then
  echo "› build: up to date"
  exit 0
fi
echo "› build: building the app (about a minute)"
npx next build > .data/build.log 2>&1 || { tail -40 .data/build.log >&2; exit 1; }
echo "› build: done"
