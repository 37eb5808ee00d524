#!/usr/bin/env bash
# Runs before `npm start` and `npm test` (npm's pre-scripts), so that a fresh clone needs no other command:
# installs node_modules from the lock file when they are missing or older than the lock, and Debian's
# PostgreSQL (and, for the tests, Chromium) when their binaries are missing. Needs root only for apt-get.
set -euo pipefail
cd "$(dirname "$0")/../../.."
want_chromium=${1:-}

if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "loftline: installing npm packages (npm ci)…"
  npm ci --no-audit --no-fund --loglevel=error
fi

need_apt=()
ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1 || need_apt+=(postgresql)
if [ "$want_chromium" = "--with-chromium" ] && ! command -v chromium >/dev/null 2>&1; then need_apt+=(chromium); fi
if [ ${#need_apt[@]} -gt 0 ]; then
  if [ "$(id -u)" != "0" ]; then
    echo "loftline: missing Debian packages: ${need_apt[*]} — install them (apt-get install -y ${need_apt[*]}) and run again" >&2
    exit 1
  fi
  echo "loftline: installing Debian packages: ${need_apt[*]}…"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq "${need_apt[@]}" >/dev/null
fi
