#!/usr/bin/env bash
# npm run load: the 60-second load and fault run against a production build on a fresh database.
# npm run load cluster: the same walkers through HAProxy to two app processes sharing one
# database and one fake S3 bucket, one of them killed (SIGKILL) 20 s in and restarted.
# Everything it starts (servers, a test cluster that was not running) is stopped when it ends,
# also on Ctrl-C.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/common.sh
MODE=${1:-single}
ensure_node_modules
LOGS=$(mktemp -d /tmp/rootbench-load.XXXXXX)
export LOAD_LOGS=$LOGS
stop_load() { # the process the cluster run restarted is not one start_bg knows
  [ -f "$LOGS/restarted.pid" ] && kill -TERM -- "-$(cat "$LOGS/restarted.pid")" 2>/dev/null || true
  stop_started
}
stop_on_exit
trap stop_load EXIT
export DB_CLUSTER=test DB_PORT=${TEST_DB_PORT:-}
start_cluster
bash scripts/db.sh drop-db rootbench_load >/dev/null
bash scripts/db.sh create-db rootbench_load >/dev/null
export DATABASE_URL=$(db_url_for test "$DB_PORT" rootbench_load)
if [ "$MODE" = cluster ]; then
  source scripts/cluster/parts.sh
  ensure_haproxy
  pick_port LOAD_S3_PORT 4531
  use_fake_s3 "$LOAD_S3_PORT" "$LOGS/s3"
fi
npx tsx --conditions=react-server db/migrate.ts >/dev/null
npx tsx --conditions=react-server db/seed/index.ts >/dev/null
ensure_build
pick_port LOAD_SMTP_PORT 2727
if [ "$MODE" = cluster ]; then
  read -r -a ports <<< "$(app_ports 2)"
  start_app_process 1 "${ports[0]}"
  start_app_process 2 "${ports[1]}"
  for p in "${ports[@]}"; do wait_for_http "http://127.0.0.1:$p/api/health" 90 || { tail -n 40 "$LOGS"/app-*.log; exit 1; }; done
  pick_port LOAD_HAPROXY_PORT 3400
  start_haproxy "$LOAD_HAPROXY_PORT" "${ports[@]}"
  wait_for_http "http://127.0.0.1:$LOAD_HAPROXY_PORT/api/health" 30 || { cat "$LOGS/haproxy.log"; exit 1; }
  LOAD_BASE_URL="http://127.0.0.1:$LOAD_HAPROXY_PORT" LOAD_KILL_PID=$APP_PID_1 LOAD_KILL_PORT=${ports[0]} \
    npx tsx --conditions=react-server scripts/load/run.ts
else
  pick_port LOAD_PORT 3300
  start_bg "$LOGS/server.log" env NODE_ENV=production node node_modules/next/dist/bin/next start -p "$LOAD_PORT" -H 127.0.0.1
  wait_for_http "http://127.0.0.1:$LOAD_PORT/api/health" 90 || { tail -n 40 "$LOGS/server.log"; exit 1; }
  LOAD_BASE_URL="http://127.0.0.1:$LOAD_PORT" npx tsx --conditions=react-server scripts/load/run.ts
fi
