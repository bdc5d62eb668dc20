#!/usr/bin/env bash
# `npm run bench:load`: the app on a throwaway PostgreSQL with the demo scenario, loaded by
# autocannon on loopback with a bounded number of requests (BENCH_REQUESTS), then reconciled.
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/deps.sh
source scripts/lib/postgres.sh
source scripts/lib/services.sh

ensure_node_modules || exit 1
export NODE_ENV=test
THROWAWAY=
SERVER_PID=
cleanup() {
  [ -n "$SERVER_PID" ] && { kill "$SERVER_PID" 2>/dev/null; wait "$SERVER_PID" 2>/dev/null; }
  services_stop
  pg_stop
  [ -n "$THROWAWAY" ] && rm -rf "$THROWAWAY"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

pg_install_if_missing || exit 1
port=$(free_port)
THROWAWAY=$(mktemp -d /tmp/duskhaul-bench-XXXXXX)
chmod 755 "$THROWAWAY"
pg_start "$THROWAWAY/pg" "$port" "-c fsync=off -c synchronous_commit=off -c max_connections=200" || exit 1
pg_create_database "$port" duskhaul_bench
export DATABASE_URL="postgres://postgres@127.0.0.1:$port/duskhaul_bench"
export SESSION_SECRET=bench-secret-not-for-production-0123456789
services_start || exit 1
node --import tsx scripts/migrate.ts || exit 1
node --import tsx scripts/seed.ts --if-empty || exit 1
export PORT=$(free_port) CLIENT_DIST=none DATABASE_POOL_SIZE=20
node --import tsx server/index.ts &
SERVER_PID=$!
node --import tsx scripts/wait-for-health.ts "http://127.0.0.1:$PORT/api/health" || exit 1
BASE_URL="http://127.0.0.1:$PORT" node --import tsx bench/load.bench.ts
