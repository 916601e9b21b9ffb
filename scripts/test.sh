#!/usr/bin/env bash
# npm test: its own set-up (packages, Chromium, a throwaway test cluster), then typecheck, ESLint,
# vitest (unit + integration on real PostgreSQL) and the browser tests against a production build.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/common.sh
started=$(date +%s)
results=$(mktemp -d)

ensure_node_modules
ensure_chromium
ensure_poppler

export DB_CLUSTER=test DB_PORT=${TEST_DB_PORT:-54339}
bash scripts/db.sh start
for name in rootbench_test rootbench_e2e; do
  bash scripts/db.sh drop-db "$name" >/dev/null
  bash scripts/db.sh create-db "$name" >/dev/null
done
export TEST_DATABASE_URL=$(db_url_for test "$DB_PORT" rootbench_test)
E2E_DATABASE_URL=$(db_url_for test "$DB_PORT" rootbench_e2e)
DATABASE_URL=$TEST_DATABASE_URL npx tsx --conditions=react-server db/migrate.ts

step() { echo; echo "== $1"; }

step "typecheck"
npx tsc --noEmit -p tsconfig.json

step "lint"
npx eslint . --max-warnings=0

step "unit and integration tests"
DATABASE_URL=$TEST_DATABASE_URL npx vitest run --config tests/vitest.config.ts \
  --reporter=default --reporter=json --outputFile.json="$results/vitest.json"

step "browser tests"
ensure_build
DATABASE_URL=$E2E_DATABASE_URL npx tsx --conditions=react-server db/migrate.ts
DATABASE_URL=$E2E_DATABASE_URL npx tsx --conditions=react-server db/seed/index.ts >/dev/null
E2E_PORT=${E2E_PORT:-3100}
export E2E_SMTP_PORT=${E2E_SMTP_PORT:-2626}
pids=()
cleanup() { for p in "${pids[@]}"; do kill "$p" 2>/dev/null || true; done; }
trap cleanup EXIT
if [ -f scripts/mail/fake-smtp.ts ]; then
  SMTP_PORT=$E2E_SMTP_PORT SMTP_CONTROL_PORT=$((E2E_SMTP_PORT + 1)) npx tsx --conditions=react-server scripts/mail/fake-smtp.ts >"$results/smtp.log" 2>&1 & pids+=($!)
fi
if [ -f scripts/mail/worker.ts ]; then
  DATABASE_URL=$E2E_DATABASE_URL SMTP_PORT=$E2E_SMTP_PORT MAIL_POLL_MS=300 npx tsx --conditions=react-server scripts/mail/worker.ts >"$results/mail-worker.log" 2>&1 & pids+=($!)
fi
NODE_ENV=production DATABASE_URL=$E2E_DATABASE_URL SMTP_PORT=$E2E_SMTP_PORT \
  node node_modules/next/dist/bin/next start -p "$E2E_PORT" -H 127.0.0.1 >"$results/server.log" 2>&1 & pids+=($!)
wait_for_http "http://127.0.0.1:$E2E_PORT/api/health" 90 || { tail -n 40 "$results/server.log"; exit 1; }
E2E_BASE_URL="http://127.0.0.1:$E2E_PORT" DATABASE_URL=$E2E_DATABASE_URL E2E_SMTP_CONTROL="http://127.0.0.1:$((E2E_SMTP_PORT + 1))" \
  npx vitest run --config tests/e2e/vitest.config.ts \
  --reporter=default --reporter=json --outputFile.json="$results/e2e.json" || { tail -n 40 "$results/server.log"; exit 1; }

node -e '
  const fs = require("fs"); let p = 0, f = 0, s = 0;
  for (const file of process.argv.slice(1)) {
    if (!fs.existsSync(file)) continue;
    const r = JSON.parse(fs.readFileSync(file, "utf8"));
    p += r.numPassedTests; f += r.numFailedTests; s += r.numPendingTests + (r.numTodoTests || 0);
  }
  console.log(`\n${p} passed, ${f} failed, ${s} skipped`);
' "$results/vitest.json" "$results/e2e.json"
echo "npm test took $(( $(date +%s) - started )) s"
