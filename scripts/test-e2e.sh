#!/usr/bin/env bash
# Browser tests against a production build, a temporary database and a free port.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-chromium.sh

work=$(mktemp -d -t rimscale-e2e-XXXXXX)
trap 'rm -rf "$work"' EXIT
export RIMSCALE_DB_FILE="$work/e2e.sqlite"
# Template photos uploaded by the browser tests go with the temporary database.
export RIMSCALE_UPLOAD_DIR="$work/uploads"
export NEXT_DIST_DIR="${NEXT_DIST_DIR:-.next-e2e}"
port=$(node scripts/free-port.mjs)
export E2E_BASE_URL="http://127.0.0.1:$port"
export APP_URL="$E2E_BASE_URL"
# A fresh session-signing key per run (next start is a production server and needs one).
export NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-$(node -e "console.log(require('node:crypto').randomBytes(32).toString('base64'))")}"
# The local SMTP fake, started by playwright.config.ts beside the app, on ports of its own.
export MAIL_FAKE_SMTP_PORT=$(node scripts/free-port.mjs)
export MAIL_FAKE_HTTP_PORT=$(node scripts/free-port.mjs)
export MAIL_FAKE_DATA_FILE="$work/mail-fake.json"
export SMTP_URL="smtp://127.0.0.1:$MAIL_FAKE_SMTP_PORT"
export MAIL_FAKE_URL="http://127.0.0.1:$MAIL_FAKE_HTTP_PORT"

bash scripts/db.sh migrate:latest >/dev/null
bash scripts/db.sh seed:run >/dev/null
node scripts/build-pdf-worker.mjs # the PDF pool's worker bundle, beside the Next build
npx next build >"$work/build.log" 2>&1 || { cat "$work/build.log"; exit 1; }
npx playwright test "$@"
