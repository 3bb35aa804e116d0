#!/usr/bin/env bash
# Runs the knex CLI on knexfile.ts (knex cannot load TypeScript by itself on Node 20).
set -euo pipefail
exec npx tsx node_modules/knex/bin/cli.js --knexfile knexfile.ts "$@"
