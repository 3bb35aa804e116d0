#!/usr/bin/env bash
# npm run check:two-instances — two production servers on one PostgreSQL and one S3 fake.
# Needs a production build: it makes one in $NEXT_DIST_DIR (default .next-two-instances)
# unless one is already there (delete the folder to rebuild after a change).
# As root it installs and starts Debian's postgresql when missing (scripts/postgres-up.sh).
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_DIST_DIR="${NEXT_DIST_DIR:-.next-two-instances}"
if [ ! -f "$NEXT_DIST_DIR/BUILD_ID" ]; then
  echo "== production build into $NEXT_DIST_DIR (the production server needs one)"
  npx next build >"${TMPDIR:-/tmp}/rimscale-two-instances-build.log" 2>&1 || { cat "${TMPDIR:-/tmp}/rimscale-two-instances-build.log"; exit 1; }
else
  echo "== using the production build in $NEXT_DIST_DIR (delete it to rebuild)"
fi
echo "== PostgreSQL"
DATABASE_URL="$(bash scripts/postgres-up.sh rimscale_two_instances)"
export DATABASE_URL
echo "   $DATABASE_URL (fresh database)"
bash scripts/db.sh migrate:latest >/dev/null
bash scripts/db.sh seed:run >/dev/null
# The SDK's notice that its 2027 releases need Node 22 is in README; keep the report readable.
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
exec node node_modules/tsx/dist/cli.mjs scripts/check-two-instances.ts
