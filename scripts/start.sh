#!/usr/bin/env bash
# `npm start`: set up whatever is missing, build the client, serve app + API from one process.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/setup.sh
source .data/env
echo "[start] building the client"
npx vite build --logLevel warn
exec npx tsx server/main.ts
