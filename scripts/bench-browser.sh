#!/usr/bin/env bash
# Browser benchmarks (issues 5 and 6) in headless Debian Chromium: the planner page on a
# 40-truck night, Tonight reopened offline from the service worker's cache, and the Atlas with
# 2,000 yards / 500 sites / 300 moves against a bare Leaflet page. A throwaway PostgreSQL (each
# script makes its own database on it with the demo seed) and a throwaway client build, so the
# checkout's dist/ and databases are never touched. Bounded: about 3 minutes in all.
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/deps.sh
source scripts/lib/postgres.sh
source scripts/lib/services.sh

if [ ! -x /usr/bin/chromium ]; then
  echo "browser benchmarks skipped: /usr/bin/chromium is missing (apt-get install -y chromium)"
  exit 0
fi
ensure_node_modules || exit 1
export NODE_ENV=test
THROWAWAY=
cleanup() {
  pg_stop
  [ -n "$THROWAWAY" ] && rm -rf "$THROWAWAY"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

pg_install_if_missing || exit 1
port=$(free_port)
THROWAWAY=$(mktemp -d /tmp/duskhaul-bench-browser-XXXXXX)
chmod 755 "$THROWAWAY"
pg_start "$THROWAWAY/pg" "$port" "-c fsync=off -c synchronous_commit=off" || exit 1
export DATABASE_URL="postgres://postgres@127.0.0.1:$port/postgres"
export SESSION_SECRET=bench-secret-not-for-production-0123456789

echo "== Building the client into $THROWAWAY/client/dist"
# Vite refuses to build while another build of this project runs (a concurrent `npm test`):
# wait for it a little; our output folder is our own either way.
built=
for _ in 1 2 3 4 5 6 7 8 9 10 11 12; do
  # A production bundle: under NODE_ENV=test Vite builds for development, without the worker.
  if NODE_ENV=production npx vite build --logLevel error --outDir "$THROWAWAY/client/dist" --emptyOutDir \
    2>"$THROWAWAY/build.log"; then
    built=1
    break
  fi
  grep -q 'another Vite build' "$THROWAWAY/build.log" || break
  sleep 5
done
if [ -z "$built" ]; then
  cat "$THROWAWAY/build.log" >&2
  exit 1
fi
export BENCH_CLIENT_ROOT="$THROWAWAY/client"

status=0
for script in planner-page tonight-offline atlas-render; do
  echo "== bench/$script.bench.ts"
  timeout 300 node --import tsx "bench/$script.bench.ts" || status=1
done
exit $status
