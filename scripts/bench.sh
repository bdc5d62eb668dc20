#!/usr/bin/env bash
# `npm run bench`: speed figures (never part of `npm test`).
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/deps.sh
ensure_node_modules
echo "== Calculations (bench/calc.bench.ts)"
node --import tsx bench/calc.bench.ts
echo "== Move planning (bench/moves.bench.ts)"
node --import tsx bench/moves.bench.ts
echo "== Map tiles (bench/tiles.bench.ts)"
node --import tsx bench/tiles.bench.ts
echo "== Browser: planner page, Tonight offline, Atlas render (scripts/bench-browser.sh)"
if [ -x /usr/bin/chromium ]; then bash scripts/bench-browser.sh; else echo "skipped: no /usr/bin/chromium"; fi
