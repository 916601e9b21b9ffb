#!/usr/bin/env bash
# npm run cluster: the several-process setup on one machine. Builds once, then starts N app
# processes (CLUSTER_SIZE, default 2) on loopback ports, each with its outbox worker, HAProxy on
# HAPROXY_PORT (default 3400) in front of them checking /api/health, the fake S3 and fake SMTP
# servers, and one PostgreSQL (the app cluster). App ports: APP_PORTS ("3401 3402"), else free ones
# from 3401 up. Ctrl-C stops everything it started.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/common.sh
source scripts/cluster/parts.sh
ensure_node_modules
ensure_haproxy
stop_on_exit
N=${CLUSTER_SIZE:-2}
LOGS=.data/cluster/logs
mkdir -p "$LOGS"

export DB_CLUSTER=app
start_cluster
export DATABASE_URL=${DATABASE_URL:-$(db_url_for app "$DB_PORT" rootbench)}
# The fake S3 first: the seed's photos go where the app processes will look for them.
pick_port S3_PORT 4530
use_fake_s3 "$S3_PORT" .data/s3
npx tsx --conditions=react-server db/migrate.ts
npx tsx --conditions=react-server db/seed/index.ts

# One build for every process, made with the shared server-actions key.
ensure_actions_key
echo "[cluster] building the app once for all $N processes"
run_in_group "$LOGS/build.log" npx next build || { tail -n 40 "$LOGS/build.log"; exit 1; }

pick_port SMTP_PORT 2525
start_bg "$LOGS/fake-smtp.log" env SMTP_CONTROL_PORT=$((SMTP_PORT + 1)) npx tsx --conditions=react-server scripts/mail/fake-smtp.ts

read -r -a ports <<< "$(app_ports "$N")"
[ ${#ports[@]} -eq "$N" ] || exit 1
for i in $(seq 1 "$N"); do
  start_app_process "$i" "${ports[$((i - 1))]}"
  start_mail_worker "$i"
done
for p in "${ports[@]}"; do
  wait_for_http "http://127.0.0.1:$p/api/health" 120 || { echo "[cluster] an app process did not start; see $LOGS"; exit 1; }
done
pick_port HAPROXY_PORT 3400
start_haproxy "$HAPROXY_PORT" "${ports[@]}"
wait_for_http "http://127.0.0.1:$HAPROXY_PORT/api/health" 30 || { echo "[cluster] HAProxy did not start; see $LOGS/haproxy.log"; exit 1; }
echo "[cluster] $N app processes (ports ${ports[*]}) behind HAProxy: http://127.0.0.1:$HAPROXY_PORT"
echo "[cluster] photos in the fake S3 at $S3_ENDPOINT, mail in the fake SMTP (control http://127.0.0.1:$((SMTP_PORT + 1))/messages), logs in $LOGS"
wait "${STARTED_PIDS[@]}"
