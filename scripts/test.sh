#!/usr/bin/env bash
# The whole suite: lint and layers, types, unit and integration tests, then browser tests.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_DIST_DIR="${NEXT_DIST_DIR:-.next-e2e}"
echo "== lint: ESLint with the layer rules, then knip for unused files, exports and dependencies"
npm run --silent lint
npm run --silent knip
echo "== typecheck"
npx next typegen >/dev/null # route types and next-env.d.ts, which tsc reads
npx tsc --noEmit
echo "== unit and integration tests (SQLite; storage on local disk and on the S3 fake)"
bash scripts/ensure-tools.sh
npx vitest run
echo "== data-layer and API tests on PostgreSQL"
bash scripts/test-postgres.sh
echo "== browser tests"
bash scripts/test-e2e.sh
