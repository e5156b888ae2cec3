#!/usr/bin/env bash
# `npm test`: the same set-up as `npm start` against a freshly created test database, then the type
# check and every vitest project (unit, reference, api, browser). Ends with one line: N passed, N failed.
set -uo pipefail
cd "$(dirname "$0")/.."
bash scripts/setup.sh --test || { echo "0 passed, 1 failed"; exit 1; }
source .data/env
export DATABASE_URL=${DATABASE_URL%/*}/ampwright_test
export NODE_ENV=test
export AMPWRIGHT_BCRYPT_COST=10
mkdir -p .data/test-output

extra_passed=0; extra_failed=0
step() { # name, command...: a set-up or check step counted as one test
  local name=$1; shift
  echo "[test] $name"
  if "$@"; then extra_passed=$((extra_passed + 1)); else extra_failed=$((extra_failed + 1)); echo "[test] FAILED: $name"; fi
}
step "fresh test database" npx tsx server/db/prepare.ts --fresh
step "type check (vue-tsc, tsc)" npm run --silent typecheck
step "client build" npx vite build --logLevel warn

rm -f .data/test-output/vitest.json
npx vitest run --reporter=default --reporter=json --outputFile.json=.data/test-output/vitest.json
vitest_status=$?
node scripts/summarize-tests.mjs .data/test-output/vitest.json "$extra_passed" "$extra_failed" "$vitest_status"
