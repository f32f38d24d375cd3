#!/usr/bin/env bash
# Starts the local SMTP sink in the background unless it already listens (or SMTP_URL is set).
# Prints the pid it started, or nothing.
set -euo pipefail
cd "$(dirname "$0")/.."
[ -n "${SMTP_URL:-}" ] && exit 0
PORT=${MAIL_SINK_PORT:-2525}
if (exec 3<>"/dev/tcp/127.0.0.1/$PORT") 2>/dev/null; then
  exit 0
fi
mkdir -p .data
nohup node --import tsx scripts/mail-sink.ts > .data/mail-sink.log 2>&1 &
pid=$!
for _ in $(seq 1 50); do
  if (exec 3<>"/dev/tcp/127.0.0.1/$PORT") 2>/dev/null; then echo "$pid"; exit 0; fi
  sleep 0.1
done
echo "mail sink did not start; see .data/mail-sink.log" >&2
exit 1
