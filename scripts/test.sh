#!/usr/bin/env bash
# npm test: installs what the tests need, then runs every check a change must pass.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1
bash scripts/ensure-deps.sh
echo "› type-check"
npx tsc --noEmit
echo "› engine tests"
npx vitest run --project lattice
