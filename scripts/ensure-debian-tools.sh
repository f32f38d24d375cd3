#!/usr/bin/env bash
# Installs the Debian packages the tests drive when they are missing (never a browser download):
# chromium for the end-to-end tests, poppler-utils (pdftotext) to read the board packs.
set -euo pipefail
missing=()
[ -x "${CHROMIUM_PATH:-/usr/bin/chromium}" ] || missing+=(chromium)
command -v pdftotext >/dev/null || missing+=(poppler-utils)
[ ${#missing[@]} -eq 0 ] && exit 0
echo "› installing Debian's ${missing[*]} for the tests"
sudo=""
[ "$(id -u)" -ne 0 ] && sudo="sudo"
$sudo apt-get update -qq
DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq "${missing[@]}" >/dev/null
