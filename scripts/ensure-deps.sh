#!/usr/bin/env bash
# Installs npm packages when node_modules is missing or older than the lockfile.
set -euo pipefail
cd "$(dirname "$0")/.."
if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "› installing npm packages"
  npm ci --no-audit --no-fund --loglevel=error
fi
