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
# Loading tsx takes 5–8 s on a busy two-core machine: wait up to 60 s, but stop at once if the
# process died, and say why.
for _ in $(seq 1 300); do
  if (exec 3<>"/dev/tcp/127.0.0.1/$PORT") 2>/dev/null; then echo "$pid"; exit 0; fi
  if ! kill -0 "$pid" 2>/dev/null; then
    echo "› mail sink: stopped before listening on 127.0.0.1:$PORT; the end of .data/mail-sink.log says:" >&2
    tail -n 5 .data/mail-sink.log >&2
    exit 1
  fi
  sleep 0.2
done
echo "› mail sink: not listening on 127.0.0.1:$PORT after 60 s; see .data/mail-sink.log" >&2
exit 1
