#!/usr/bin/env bash
# `npm start`: install, provision PostgreSQL, migrate, seed the demo, build the client, serve.
# Ctrl-C stops everything this script started, PostgreSQL included; the data stays in .data/.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/deps.sh
source scripts/lib/postgres.sh
source scripts/lib/services.sh
source scripts/lib/session-secret.sh

ensure_node_modules
export PORT=${PORT:-3000}
# Links in e-mails and payment return pages point back here.
export APP_URL=${APP_URL:-http://localhost:$PORT}
mkdir -p .data

SERVER_PID=
cleanup() {
  trap - EXIT INT TERM
  if [ -n "$SERVER_PID" ]; then kill "$SERVER_PID" 2>/dev/null || true; wait "$SERVER_PID" 2>/dev/null || true; fi
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
echo "[build] building the client…" >&2
npx vite build --logLevel warn

node --import tsx server/index.ts &
SERVER_PID=$!
node --import tsx scripts/wait-for-health.ts "http://127.0.0.1:$PORT/api/health" && cat <<MSG

  Duskhaul is running at http://localhost:$PORT

  Demo sign-ins (password: duskhaul-demo)
    owner@demo.test     owner of Mesquite Flats Apiaries
    planner@demo.test   planner
    crew@demo.test      crew lead
    grower@demo.test    a grower with contracts
    grower2@demo.test   another grower of the same operation
    owner@second.test   owner of a separate operation (isolation)

  E-mail outbox (fake SMTP): http://127.0.0.1:${FAKE_SMTP_HTTP_PORT:-1080}/
  Online payments go to a local stand-in of the payment provider on 127.0.0.1.

  Ctrl-C stops the app and its database; the data is kept in .data/.
MSG
wait "$SERVER_PID"
