# The pieces of a several-process setup, shared by `npm run cluster` and the load test's cluster
# mode (sourced after common.sh, with stop_on_exit in force). Each function starts one thing
# through start_bg, so it is stopped with the script.

# HAProxy from Debian's package. The package starts a system-wide service of its own; that one is
# stopped and masked, and we run our own with the project's config in the foreground (-db).
ensure_haproxy() {
  if ! command -v haproxy >/dev/null 2>&1; then
    echo "[setup] installing Debian's haproxy"
    local apt=(apt-get -o DPkg::Lock::Timeout=300 install -y --no-install-recommends haproxy)
    if ! DEBIAN_FRONTEND=noninteractive "${apt[@]}" >/tmp/rootbench-apt.log 2>&1; then
      apt-get -o DPkg::Lock::Timeout=300 update >>/tmp/rootbench-apt.log 2>&1
      DEBIAN_FRONTEND=noninteractive "${apt[@]}" >>/tmp/rootbench-apt.log 2>&1
    fi
    if command -v systemctl >/dev/null 2>&1 && systemctl is-system-running >/dev/null 2>&1; then
      systemctl disable --now haproxy >/dev/null 2>&1 || true
      systemctl mask haproxy >/dev/null 2>&1 || true
    elif [ -x /etc/init.d/haproxy ]; then
      /etc/init.d/haproxy stop >/dev/null 2>&1 || true
      update-rc.d haproxy disable >/dev/null 2>&1 || true
    fi
  fi
}

# The key Next.js encrypts server action ids and closures with, the same in every process:
# NEXT_SERVER_ACTIONS_ENCRYPTION_KEY from the environment, else one made once for this checkout.
ensure_actions_key() {
  local file=.data/cluster/actions.key
  if [ -z "${NEXT_SERVER_ACTIONS_ENCRYPTION_KEY:-}" ]; then
    mkdir -p .data/cluster
    if [ ! -s "$file" ]; then (umask 077; openssl rand -base64 32 > "$file"); fi
    NEXT_SERVER_ACTIONS_ENCRYPTION_KEY=$(cat "$file")
  fi
  export NEXT_SERVER_ACTIONS_ENCRYPTION_KEY
}

# N loopback ports for the app processes: APP_PORTS when given (checked free), else free ones from 3401.
app_ports() { # count
  local out=() port
  if [ -n "${APP_PORTS:-}" ]; then
    for port in $APP_PORTS; do
      if port_in_use "$port"; then echo "[cluster] app port $port is taken by $(port_holder "$port")" >&2; exit 1; fi
      out+=("$port")
    done
  else
    port=3401
    while [ ${#out[@]} -lt "$1" ]; do port_in_use "$port" || out+=("$port"); port=$((port + 1)); done
  fi
  echo "${out[@]:0:$1}"
}

# The S3 settings for the local fake S3 (any credentials do; s3rver does not check them).
use_fake_s3() { # port dir
  export STORAGE=s3 S3_ENDPOINT="http://127.0.0.1:$1" S3_BUCKET=${S3_BUCKET:-rootbench} S3_REGION=us-east-1 \
    S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER S3_FORCE_PATH_STYLE=1
  start_bg "$LOGS/fake-s3.log" env S3_PORT="$1" S3_DIR="$2" npx tsx --conditions=react-server scripts/storage/fake-s3.ts
  for _ in $(seq 1 120); do curl -fsS -o /dev/null "$S3_ENDPOINT/$S3_BUCKET" 2>/dev/null && return 0; sleep 0.25; done
  echo "[cluster] the fake S3 did not start; see $LOGS/fake-s3.log"; exit 1
}

start_app_process() { # index port  (its log in $LOGS/app-INDEX.log)
  start_bg "$LOGS/app-$1.log" env NODE_ENV=production node node_modules/next/dist/bin/next start -p "$2" -H 127.0.0.1
  eval "APP_PID_$1=$!"
}

start_mail_worker() { # index
  start_bg "$LOGS/mail-worker-$1.log" npx tsx --conditions=react-server scripts/mail/worker.ts
}

# HAProxy on 127.0.0.1:HAPROXY_PORT in front of the app ports given, checking /api/health.
start_haproxy() { # port app-port…
  local port=$1 i=1; shift
  {
    echo "global"
    echo "  maxconn 2048"
    echo "defaults"
    echo "  mode http"
    echo "  timeout connect 2s"
    echo "  timeout client 60s"
    echo "  timeout server 60s"
    echo "  option redispatch"
    echo "  retries 2"
    echo "frontend rootbench"
    echo "  bind 127.0.0.1:$port"
    echo "  default_backend apps"
    echo "backend apps"
    echo "  balance roundrobin"
    echo "  option httpchk GET /api/health"
    echo "  http-check expect status 200"
    for app in "$@"; do
      echo "  server app$i 127.0.0.1:$app check inter 1s fall 2 rise 1"
      i=$((i + 1))
    done
  } > "$LOGS/haproxy.cfg"
  haproxy -c -q -f "$LOGS/haproxy.cfg"
  start_bg "$LOGS/haproxy.log" haproxy -f "$LOGS/haproxy.cfg" -db
}
