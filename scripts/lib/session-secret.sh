#!/usr/bin/env bash
# Sourced: a stable session secret per checkout (in .data/) unless SESSION_SECRET is set.
ensure_session_secret() {
  if [ -z "${SESSION_SECRET:-}" ]; then
    mkdir -p .data
    [ -f .data/session-secret ] || node -e "process.stdout.write(require('crypto').randomBytes(32).toString('hex'))" >.data/session-secret
    SESSION_SECRET=$(cat .data/session-secret)
    export SESSION_SECRET
  fi
}
