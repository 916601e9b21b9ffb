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

stop_on_exit
export DB_CLUSTER=test DB_PORT=${TEST_DB_PORT:-}
start_cluster
echo "[db:test] on 127.0.0.1:$DB_PORT"
for name in rootbench_test rootbench_e2e rootbench_fresh; do
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
pick_port E2E_PORT 3100
pick_port E2E_SMTP_PORT 2626
if [ -f scripts/mail/fake-smtp.ts ]; then
  start_bg "$results/smtp.log" env SMTP_PORT="$E2E_SMTP_PORT" SMTP_CONTROL_PORT=$((E2E_SMTP_PORT + 1)) npx tsx --conditions=react-server scripts/mail/fake-smtp.ts
fi
if [ -f scripts/mail/worker.ts ]; then
  start_bg "$results/mail-worker.log" env DATABASE_URL="$E2E_DATABASE_URL" SMTP_PORT="$E2E_SMTP_PORT" MAIL_POLL_MS=300 npx tsx --conditions=react-server scripts/mail/worker.ts
fi
# APP_URL names the server otherwise than the browser does, so a test can tell which one a link was built from.
export E2E_APP_URL="http://localhost:$E2E_PORT"
start_bg "$results/server.log" env NODE_ENV=production DATABASE_URL="$E2E_DATABASE_URL" SMTP_PORT="$E2E_SMTP_PORT" APP_URL="$E2E_APP_URL" \
  node node_modules/next/dist/bin/next start -p "$E2E_PORT" -H 127.0.0.1
export E2E_PROCESS_PIDS="${STARTED_PIDS[*]}"
wait_for_http "http://127.0.0.1:$E2E_PORT/api/health" 90 || { tail -n 40 "$results/server.log"; exit 1; }

# A second server: a shop of its own (ROOTBENCH_DEMO=0) on an empty database, for the first-run test.
pick_port E2E_FRESH_PORT $((E2E_PORT + 50))
FRESH_DATABASE_URL=$(db_url_for test "$DB_PORT" rootbench_fresh)
DATABASE_URL=$FRESH_DATABASE_URL npx tsx --conditions=react-server db/migrate.ts >/dev/null
start_bg "$results/fresh-mail-worker.log" env DATABASE_URL="$FRESH_DATABASE_URL" SMTP_PORT="$E2E_SMTP_PORT" MAIL_POLL_MS=300 \
  npx tsx --conditions=react-server scripts/mail/worker.ts
start_bg "$results/fresh-server.log" env NODE_ENV=production ROOTBENCH_DEMO=0 DATABASE_URL="$FRESH_DATABASE_URL" SMTP_PORT="$E2E_SMTP_PORT" APP_URL="http://127.0.0.1:$E2E_FRESH_PORT" \
  node node_modules/next/dist/bin/next start -p "$E2E_FRESH_PORT" -H 127.0.0.1
export E2E_PROCESS_PIDS="${STARTED_PIDS[*]}"
wait_for_http "http://127.0.0.1:$E2E_FRESH_PORT/api/health" 90 || { tail -n 40 "$results/fresh-server.log"; exit 1; }

E2E_FRESH_BASE_URL="http://127.0.0.1:$E2E_FRESH_PORT" E2E_BASE_URL="http://127.0.0.1:$E2E_PORT" E2E_PROCESS_PIDS="$E2E_PROCESS_PIDS" DATABASE_URL=$E2E_DATABASE_URL E2E_SMTP_CONTROL="http://127.0.0.1:$((E2E_SMTP_PORT + 1))" \
  npx vitest run --config tests/e2e/vitest.config.ts \
  --reporter=default --reporter=json --outputFile.json="$results/e2e.json" || { tail -n 40 "$results/server.log" "$results/fresh-server.log"; exit 1; }

step "two app processes behind HAProxy"
source scripts/cluster/parts.sh
ensure_haproxy
LOGS=$results/cluster
mkdir -p "$LOGS"
bash scripts/db.sh drop-db rootbench_cluster >/dev/null
bash scripts/db.sh create-db rootbench_cluster >/dev/null
export DATABASE_URL=$(db_url_for test "$DB_PORT" rootbench_cluster)
pick_port TEST_S3_PORT 4531
use_fake_s3 "$TEST_S3_PORT" "$results/s3"
npx tsx --conditions=react-server db/migrate.ts >/dev/null
npx tsx --conditions=react-server db/seed/index.ts >/dev/null
read -r -a cluster_ports <<< "$(app_ports 2)"
start_app_process 1 "${cluster_ports[0]}"
start_app_process 2 "${cluster_ports[1]}"
for p in "${cluster_ports[@]}"; do wait_for_http "http://127.0.0.1:$p/api/health" 90 || { tail -n 40 "$LOGS/app-1.log" "$LOGS/app-2.log"; exit 1; }; done
pick_port TEST_HAPROXY_PORT 3400
start_haproxy "$TEST_HAPROXY_PORT" "${cluster_ports[@]}"
wait_for_http "http://127.0.0.1:$TEST_HAPROXY_PORT/api/health" 30 || { cat "$LOGS/haproxy.log"; exit 1; }
CLUSTER_BASE_URL="http://127.0.0.1:$TEST_HAPROXY_PORT" CLUSTER_APP_URLS="http://127.0.0.1:${cluster_ports[0]} http://127.0.0.1:${cluster_ports[1]}" \
  npx vitest run --config tests/cluster/vitest.config.ts \
  --reporter=default --reporter=json --outputFile.json="$results/cluster.json" || { tail -n 40 "$LOGS/app-1.log" "$LOGS/app-2.log"; exit 1; }

node -e '
  const fs = require("fs"); let p = 0, f = 0, s = 0;
  for (const file of process.argv.slice(1)) {
    if (!fs.existsSync(file)) continue;
    const r = JSON.parse(fs.readFileSync(file, "utf8"));
    p += r.numPassedTests; f += r.numFailedTests; s += r.numPendingTests + (r.numTodoTests || 0);
  }
  console.log(`\n${p} passed, ${f} failed, ${s} skipped`);
' "$results/vitest.json" "$results/e2e.json" "$results/cluster.json"
echo "npm test took $(( $(date +%s) - started )) s"
