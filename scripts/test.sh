#!/usr/bin/env bash
# `npm test`: the whole suite against a throwaway PostgreSQL. Last line: "N passed, N failed".
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/deps.sh
source scripts/lib/postgres.sh
source scripts/lib/services.sh

ensure_node_modules || exit 1
export NO_COLOR=1 NODE_ENV=test

THROWAWAY=
cleanup() {
  services_stop
  pg_stop
  [ -n "$THROWAWAY" ] && rm -rf "$THROWAWAY"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

if [ ! -x /usr/bin/chromium ]; then
  if [ "$(id -u)" = 0 ]; then
    echo "[test] installing Debian's Chromium for the browser tests (one time)…" >&2
    DEBIAN_FRONTEND=noninteractive apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null || exit 1
  else
    echo "[test] /usr/bin/chromium is missing: sudo apt-get install -y chromium" >&2
    exit 1
  fi
fi

if [ -z "${DATABASE_URL:-}" ]; then
  pg_install_if_missing || exit 1
  port=$(node -e "const s=require('net').createServer().listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})")
  THROWAWAY=$(mktemp -d /tmp/duskhaul-test-XXXXXX)
  chmod 755 "$THROWAWAY"
  pg_start "$THROWAWAY/pg" "$port" "-c fsync=off -c synchronous_commit=off -c full_page_writes=off -c max_connections=200" || exit 1
  pg_create_database "$port" duskhaul_test
  export DATABASE_URL="postgres://postgres@127.0.0.1:$port/duskhaul_test"
  export TEST_PG_DATA="$THROWAWAY/pg" TEST_PG_PORT="$port"
fi
export SESSION_SECRET=${SESSION_SECRET:-test-secret-not-for-production-0123456789}

services_start || exit 1
node --import tsx scripts/migrate.ts || exit 1
echo "[test] type-check, lint and build…" >&2
npx tsc --noEmit -p tsconfig.json || exit 1
npx eslint . --max-warnings 0 || exit 1
npx prettier --check . --log-level warn || exit 1
# The browser tests run against the production build (NODE_ENV=test would make Vite build a
# development bundle without the service worker).
NODE_ENV=production npx vite build --logLevel warn || exit 1

mkdir -p test-output
npx vitest run --reporter=default --reporter=json --outputFile.json=test-output/vitest.json "$@"
node scripts/summarise-tests.mjs test-output/vitest.json
