#!/usr/bin/env bash
# Installs Debian's Chromium for the end-to-end tests when it is missing (never a browser download).
set -euo pipefail
if [ -x "${CHROMIUM_PATH:-/usr/bin/chromium}" ]; then exit 0; fi
echo "› installing Debian's chromium for the end-to-end tests"
sudo=""
[ "$(id -u)" -ne 0 ] && sudo="sudo"
$sudo apt-get update -qq
DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq chromium >/dev/null
