#!/usr/bin/env bash
# Environment for the local stand-ins; sourced with "dev" or "test" so that a
# running `npm start` and a test run never share ports or data.
# Values already set in the environment (a real SMTP or S3) win.
case "${1:-dev}" in
  test) base=1; datadir="$ROOT/.data/test" ;;
  *)    base=0; datadir="$ROOT/.data/dev" ;;
esac
mkdir -p "$datadir"
export PORT="${PORT:-$((3000 + base * 100))}"
export NEXTAUTH_URL="${NEXTAUTH_URL:-http://localhost:$PORT}"
export APP_URL="${APP_URL:-$NEXTAUTH_URL}"
export SMTP_URL="${SMTP_URL:-smtp://127.0.0.1:$((2525 + base * 100))}"
export MAILBOX_URL="${MAILBOX_URL:-http://127.0.0.1:$((2580 + base * 100))}"
export MAIL_FROM="${MAIL_FROM:-Airproof <no-reply@airproof.local>}"
export S3_ENDPOINT="${S3_ENDPOINT:-http://127.0.0.1:$((4569 + base * 100))}"
export S3_BUCKET="${S3_BUCKET:-airproof}"
export S3_REGION="${S3_REGION:-us-east-1}"
export AWS_ACCESS_KEY_ID="${AWS_ACCESS_KEY_ID:-S3RVER}"
export AWS_SECRET_ACCESS_KEY="${AWS_SECRET_ACCESS_KEY:-S3RVER}"
export LOCAL_SERVICES_DIR="${LOCAL_SERVICES_DIR:-$datadir}"
# The proof worker (scripts/worker.ts) answers GET /health here, so scripts can wait for it.
export WORKER_HEALTH_URL="${WORKER_HEALTH_URL:-http://127.0.0.1:$((4590 + base * 100))}"
