#!/usr/bin/env bash
# Sourced: installs the npm dependencies from the lockfile when they are missing or stale.
ensure_node_modules() {
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "[deps] installing npm dependencies (npm ci)…" >&2
    npm ci --no-audit --no-fund >&2
  fi
}
