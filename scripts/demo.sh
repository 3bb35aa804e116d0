#!/usr/bin/env bash
# Demo: migrate, seed the invented shop, build and serve on port 3000.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/db.sh migrate:latest
bash scripts/db.sh seed:run
npx next build
exec node node_modules/next/dist/bin/next start -p "${PORT:-3000}"
