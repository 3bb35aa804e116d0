#!/usr/bin/env bash
# The whole suite: types, unit and integration tests, then browser tests.
set -euo pipefail
cd "$(dirname "$0")/.."
echo "== typecheck"
npx tsc --noEmit
echo "== unit and integration tests"
npx vitest run
echo "== browser tests"
bash scripts/test-e2e.sh
