#!/usr/bin/env bash
# npm start: everything a fresh clone needs, then the production server on PORT (default 3000).
# ROOTBENCH_DEMO=0 starts a shop of its own: no demo data or accounts, no fake SMTP server; the
# first visit leads to /setup. HOST (default 127.0.0.1) is the interface to listen on.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/common.sh
started=$(date +%s)

ensure_node_modules
bash scripts/db.sh start
export DB_PORT=${DB_PORT:-54329}
export DATABASE_URL=${DATABASE_URL:-$(db_url_for app "$DB_PORT" rootbench)}
npx tsx --conditions=react-server db/migrate.ts
npx tsx --conditions=react-server db/seed/index.ts
ensure_build

export PORT=${PORT:-3000}
export SMTP_PORT=${SMTP_PORT:-2525}
export ROOTBENCH_DEMO=${ROOTBENCH_DEMO:-1}
export APP_URL=${APP_URL:-http://localhost:$PORT}
export NODE_ENV=production
HOST=${HOST:-127.0.0.1}
pids=()
cleanup() { for p in "${pids[@]}"; do kill "$p" 2>/dev/null || true; done; }
trap cleanup EXIT INT TERM

if [ "$ROOTBENCH_DEMO" != 0 ] && [ "${SMTP_HOST:-127.0.0.1}" = 127.0.0.1 ] && [ -f scripts/mail/fake-smtp.ts ] && [ "${FAKE_SMTP:-1}" = 1 ]; then
  npx tsx --conditions=react-server scripts/mail/fake-smtp.ts & pids+=($!)
fi
if [ -f scripts/mail/worker.ts ]; then
  npx tsx --conditions=react-server scripts/mail/worker.ts & pids+=($!)
fi

node node_modules/next/dist/bin/next start -p "$PORT" -H "$HOST" & pids+=($!)
if wait_for_http "http://127.0.0.1:$PORT/api/health" 90; then
  npx tsx --conditions=react-server db/seed/print-accounts.ts "http://localhost:$PORT" "$(( $(date +%s) - started ))"
else
  echo "the server did not become ready; see the output above"; exit 1
fi
wait "${pids[-1]}"
