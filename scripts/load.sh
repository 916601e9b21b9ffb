#!/usr/bin/env bash
# npm run load: the 60-second load and fault run against a production build on a fresh database.
# Everything it starts (the server, a test cluster that was not running) is stopped when it ends,
# also on Ctrl-C.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/common.sh
ensure_node_modules
stop_on_exit
export DB_CLUSTER=test DB_PORT=${TEST_DB_PORT:-}
start_cluster
bash scripts/db.sh drop-db rootbench_load >/dev/null
bash scripts/db.sh create-db rootbench_load >/dev/null
export DATABASE_URL=$(db_url_for test "$DB_PORT" rootbench_load)
npx tsx --conditions=react-server db/migrate.ts >/dev/null
npx tsx --conditions=react-server db/seed/index.ts >/dev/null
ensure_build
LOGS=$(mktemp -d /tmp/rootbench-load.XXXXXX)
pick_port LOAD_PORT 3300
pick_port LOAD_SMTP_PORT 2727
start_bg "$LOGS/server.log" env NODE_ENV=production node node_modules/next/dist/bin/next start -p "$LOAD_PORT" -H 127.0.0.1
wait_for_http "http://127.0.0.1:$LOAD_PORT/api/health" 90 || { tail -n 40 "$LOGS/server.log"; exit 1; }
LOAD_BASE_URL="http://127.0.0.1:$LOAD_PORT" npx tsx --conditions=react-server scripts/load/run.ts
