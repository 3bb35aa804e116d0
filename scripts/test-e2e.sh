#!/usr/bin/env bash
# Browser tests against a production build, a temporary database and a free port.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-chromium.sh

work=$(mktemp -d -t rimscale-e2e-XXXXXX)
trap 'rm -rf "$work"' EXIT
export RIMSCALE_DB_FILE="$work/e2e.sqlite"
export NEXT_DIST_DIR="${NEXT_DIST_DIR:-.next-e2e}"
port=$(node scripts/free-port.mjs)
export E2E_BASE_URL="http://127.0.0.1:$port"

bash scripts/db.sh migrate:latest >/dev/null
bash scripts/db.sh seed:run >/dev/null
npx next build >"$work/build.log" 2>&1 || { cat "$work/build.log"; exit 1; }
npx playwright test "$@"
