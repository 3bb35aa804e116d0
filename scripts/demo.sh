#!/usr/bin/env bash
# Demo: migrate, seed the invented shop, build and serve on port 3000.
set -euo pipefail
cd "$(dirname "$0")/.."
# Session key: NEXTAUTH_SECRET if given, else a fresh one (signs everyone out on restart).
export NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-$(node -e "console.log(require('node:crypto').randomBytes(32).toString('base64'))")}"
bash scripts/db.sh migrate:latest
bash scripts/db.sh seed:run
node scripts/build-pdf-worker.mjs && npx next build

# Stopping the demo (Ctrl-C, a signal or an error) stops the server and the mail fake with it.
mail_fake_pid="" server_pid=""
trap 'kill $server_pid $mail_fake_pid 2>/dev/null || true' EXIT INT TERM

export APP_URL="${APP_URL:-http://localhost:${PORT:-3000}}"
# E-mail goes to the local SMTP fake unless SMTP_URL says otherwise; /dev/inbox shows it.
if [ -z "${SMTP_URL:-}" ]; then
  export MAIL_FAKE_SMTP_PORT="${MAIL_FAKE_SMTP_PORT:-2525}" MAIL_FAKE_HTTP_PORT="${MAIL_FAKE_HTTP_PORT:-2580}"
  export SMTP_URL="smtp://127.0.0.1:$MAIL_FAKE_SMTP_PORT" MAIL_FAKE_URL="http://127.0.0.1:$MAIL_FAKE_HTTP_PORT"
  node node_modules/tsx/dist/cli.mjs scripts/mail-fake.ts &
  mail_fake_pid=$!
  echo "Mail fake running: sent e-mail appears at ${APP_URL}/dev/inbox"
fi
# Listens on this machine only (127.0.0.1) unless HOST is set on purpose, e.g. HOST=0.0.0.0 for the shop's network.
export HOST="${HOST:-127.0.0.1}" PORT="${PORT:-3000}"
# The server as `npm start` runs it: with the node flags of package.json's start script.
start_flags=$(node scripts/start-flags.mjs)
# shellcheck disable=SC2086 # the flags are words
node $start_flags scripts/server.mjs &
server_pid=$!
wait "$server_pid"
