#!/usr/bin/env bash
# `npm run dev`: PostgreSQL as for `npm start`, the API server in watch mode on 3001, and Vite's
# dev server on 3000 forwarding /api and /tiles to it. Ctrl-C stops all of them.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/deps.sh
source scripts/lib/postgres.sh
source scripts/lib/services.sh
source scripts/lib/session-secret.sh

ensure_node_modules
mkdir -p .data
PIDS=()
cleanup() {
  trap - EXIT INT TERM
  for pid in "${PIDS[@]}"; do kill "$pid" 2>/dev/null || true; done
  wait 2>/dev/null || true
  services_stop
  pg_stop
}
trap cleanup EXIT
trap 'exit 130' INT TERM

provision_app_database
ensure_session_secret

services_start
node --import tsx scripts/migrate.ts
node --import tsx scripts/seed.ts --if-empty
PORT=3001 CLIENT_DIST=no-client-in-dev node --import tsx --watch server/index.ts &
PIDS+=($!)
npx vite --port "${PORT:-3000}" --strictPort &
PIDS+=($!)
wait -n
