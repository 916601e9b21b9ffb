#!/usr/bin/env bash
# npm run bench [name…]: runs scripts/bench/<name>.ts (all of them by default) against a seeded
# bench database on the test cluster and a production server on BENCH_PORT (default 3200).
# Each benchmark prints its own table; figures are for side-by-side ratios, not absolute targets.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/common.sh
ensure_node_modules
ensure_chromium
stop_on_exit
export DB_CLUSTER=test DB_PORT=${TEST_DB_PORT:-}
start_cluster
bash scripts/db.sh drop-db rootbench_bench >/dev/null
bash scripts/db.sh create-db rootbench_bench >/dev/null
export DATABASE_URL=$(db_url_for test "$DB_PORT" rootbench_bench)
npx tsx --conditions=react-server db/migrate.ts >/dev/null
npx tsx --conditions=react-server db/seed/index.ts >/dev/null
ensure_build
pick_port BENCH_PORT 3200
export BENCH_BASE_URL="http://127.0.0.1:$BENCH_PORT"
start_bg /tmp/rootbench-bench-server.log env NODE_ENV=production node node_modules/next/dist/bin/next start -p "$BENCH_PORT" -H 127.0.0.1
wait_for_http "$BENCH_BASE_URL/api/health" 90

names=("$@")
if [ ${#names[@]} -eq 0 ]; then
  for f in scripts/bench/*.ts; do names+=("$(basename "$f" .ts)"); done
fi
for name in "${names[@]}"; do
  echo; echo "== bench: $name"
  npx tsx --conditions=react-server "scripts/bench/$name.ts"
done
