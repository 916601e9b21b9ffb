#!/usr/bin/env bash
# npm run load: the 60-second load and fault run against a production build on a fresh database.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/common.sh
ensure_node_modules
export DB_CLUSTER=test DB_PORT=${TEST_DB_PORT:-54339}
bash scripts/db.sh start >/dev/null
bash scripts/db.sh drop-db rootbench_load >/dev/null
bash scripts/db.sh create-db rootbench_load >/dev/null
export DATABASE_URL=$(db_url_for test "$DB_PORT" rootbench_load)
npx tsx --conditions=react-server db/migrate.ts >/dev/null
npx tsx --conditions=react-server db/seed/index.ts >/dev/null
ensure_build
PORT=${LOAD_PORT:-3300}
NODE_ENV=production node node_modules/next/dist/bin/next start -p "$PORT" -H 127.0.0.1 >/tmp/rootbench-load-server.log 2>&1 &
server=$!
trap 'kill $server 2>/dev/null || true' EXIT
wait_for_http "http://127.0.0.1:$PORT/api/health" 90
LOAD_BASE_URL="http://127.0.0.1:$PORT" npx tsx --conditions=react-server scripts/load/run.ts
