#!/usr/bin/env bash
# Sourced: local fakes of hosted services, started by `npm start`, `npm run dev` and `npm test`
# on loopback. A real service configured through the environment replaces its fake.

SERVICE_PIDS=()

free_port() {
  node -e "const s=require('net').createServer().listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})"
}

# Waits until something listens on 127.0.0.1:$1 (up to 10 s).
wait_for_port() {
  for _ in $(seq 1 100); do
    node -e "require('net').connect($1,'127.0.0.1').on('connect',()=>process.exit(0)).on('error',()=>process.exit(1))" && return 0
    sleep 0.1
  done
  return 1
}

# Fake SMTP with a readable outbox, unless a real SMTP_HOST is configured.
start_fake_smtp() {
  [ -n "${SMTP_HOST:-}" ] && return 0
  if [ "${NODE_ENV:-}" = test ]; then
    FAKE_SMTP_PORT=${FAKE_SMTP_PORT:-$(free_port)}
    FAKE_SMTP_HTTP_PORT=${FAKE_SMTP_HTTP_PORT:-$(free_port)}
  else
    FAKE_SMTP_PORT=${FAKE_SMTP_PORT:-2525}
    FAKE_SMTP_HTTP_PORT=${FAKE_SMTP_HTTP_PORT:-1080}
  fi
  export FAKE_SMTP_PORT FAKE_SMTP_HTTP_PORT
  node --import tsx scripts/fake-smtp.ts &
  SERVICE_PIDS+=($!)
  export SMTP_HOST=127.0.0.1 SMTP_PORT=$FAKE_SMTP_PORT SMTP_SECURE=false
  wait_for_port "$FAKE_SMTP_PORT" || { echo "[services] the fake SMTP server did not start" >&2; return 1; }
}

# Fake hosted-payments provider (API, checkout page, signed webhooks), unless a real
# PAYMENTS_SECRET_KEY is configured. Keys are fresh per run; the webhook goes to this app.
start_fake_payments() {
  [ -n "${PAYMENTS_SECRET_KEY:-}" ] && return 0
  if [ "${NODE_ENV:-}" = test ]; then
    FAKE_PAYMENTS_PORT=${FAKE_PAYMENTS_PORT:-$(free_port)}
  else
    FAKE_PAYMENTS_PORT=${FAKE_PAYMENTS_PORT:-12111}
  fi
  local random
  random=$(node -e "console.log(require('crypto').randomBytes(24).toString('hex'))")
  export FAKE_PAYMENTS_PORT
  export FAKE_PAYMENTS_API_KEY="sk_test_fake_${random:0:24}"
  export FAKE_PAYMENTS_WEBHOOK_SECRET="whsec_fake_${random:24}"
  export FAKE_PAYMENTS_WEBHOOK_URL="http://127.0.0.1:${PORT:-3000}/api/payments/webhook"
  node --import tsx scripts/fake-payments.ts &
  SERVICE_PIDS+=($!)
  export PAYMENTS_SECRET_KEY=$FAKE_PAYMENTS_API_KEY PAYMENTS_WEBHOOK_SECRET=$FAKE_PAYMENTS_WEBHOOK_SECRET
  export PAYMENTS_API_HOST=127.0.0.1 PAYMENTS_API_PORT=$FAKE_PAYMENTS_PORT PAYMENTS_API_PROTOCOL=http
  wait_for_port "$FAKE_PAYMENTS_PORT" || { echo "[services] the fake payments provider did not start" >&2; return 1; }
}

services_start() {
  start_fake_smtp || return 1
  start_fake_payments
}

services_stop() {
  local pid
  for pid in "${SERVICE_PIDS[@]}"; do
    kill "$pid" 2>/dev/null || true
    wait "$pid" 2>/dev/null || true
  done
  SERVICE_PIDS=()
}
