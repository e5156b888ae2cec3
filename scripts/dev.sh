#!/usr/bin/env bash
# `npm run dev`: the API server (restarting on change) plus Vite's hot-reloading client, proxied.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/setup.sh
source .data/env
export PORT=${PORT:-8080}
npx tsx watch server/main.ts &
api=$!
trap 'kill $api 2>/dev/null || true' EXIT
npx vite
