#!/usr/bin/env bash
# npm run bench [name…]: runs scripts/bench/<name>.ts (all of them by default) against a seeded
# bench database on the test cluster and a production server on BENCH_PORT (default 3200).
# Benchmarks that need neither (a simulation such as `learning`) run on their own, with no set-up.
# Each benchmark prints its own table; compare figures measured side by side in one run. The budgets
# for what a person feels are checked by `npm run bench perceived`.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/common.sh
ensure_node_modules

STANDALONE=(learning)
is_standalone() { local n; for n in "${STANDALONE[@]}"; do [ "$n" = "$1" ] && return 0; done; return 1; }
run_bench() { echo; echo "== bench: $1"; npx tsx --conditions=react-server "scripts/bench/$1.ts"; }

names=("$@")
if [ ${#names[@]} -eq 0 ]; then
  for f in scripts/bench/*.ts; do names+=("$(basename "$f" .ts)"); done
fi
for name in "${names[@]}"; do
  [ -f "scripts/bench/$name.ts" ] || { echo "No benchmark scripts/bench/$name.ts" >&2; exit 1; }
done
served=()
for name in "${names[@]}"; do
  if is_standalone "$name"; then run_bench "$name"; else served+=("$name"); fi
done
[ ${#served[@]} -eq 0 ] && exit 0

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

for name in "${served[@]}"; do run_bench "$name"; done
