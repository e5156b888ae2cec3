#!/usr/bin/env bash
# Sets up what a fresh machine lacks, then starts the project-local PostgreSQL cluster.
#   scripts/setup.sh            for `npm start` / `npm run dev`
#   scripts/setup.sh --test     also installs the browser and the reference solver used by `npm test`
# Safe to re-run: every step checks before it acts. Writes .data/env (DATABASE_URL, PG port).
set -euo pipefail
cd "$(dirname "$0")/.."
ROOT=$PWD
MODE=${1:-}
DATA_DIR=$ROOT/.data
mkdir -p "$DATA_DIR"

say() { printf '[setup] %s\n' "$*"; }
die() { printf '[setup] error: %s\n' "$*" >&2; exit 1; }
is_root() { [ "$(id -u)" = 0 ]; }

APT_UPDATED=0
apt_install() {
  is_root || die "missing Debian packages ($*): run as root or install them: apt-get install $*"
  if [ $APT_UPDATED = 0 ]; then
    say "apt-get update"
    DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null || die "apt-get update failed"
    APT_UPDATED=1
  fi
  say "installing Debian packages: $*"
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "$@" >/dev/null \
    || die "apt-get install $* failed"
}

# 1. Node dependencies (reinstalled when package-lock.json is newer than the installed tree).
if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  say "installing npm dependencies"
  if [ -f package-lock.json ]; then npm ci --no-audit --no-fund; else npm install --no-audit --no-fund; fi
fi

# 2. Debian packages: PostgreSQL always; chromium and ngspice for the test suite.
PGBIN=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1 || true)
if [ -z "$PGBIN" ] || [ ! -x "$PGBIN/initdb" ]; then
  apt_install postgresql
  PGBIN=$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -1)
fi
if [ "$MODE" = --test ]; then
  missing=()
  [ -x /usr/bin/chromium ] || missing+=(chromium)
  command -v ngspice >/dev/null 2>&1 || missing+=(ngspice)
  command -v pdftotext >/dev/null 2>&1 || missing+=(poppler-utils)
  [ ${#missing[@]} = 0 ] || apt_install "${missing[@]}"
fi

# 3. The project-local cluster, on loopback, run as the `postgres` OS user when we are root.
source scripts/pg-cluster.sh
pg_cluster_start
