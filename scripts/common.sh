# Shared steps of start.sh, test.sh and dev.sh (sourced, not run).
export NEXT_TELEMETRY_DISABLED=1

# The patches under patches/ are applied by npm's postinstall (patch-package), so they count too.
lock_hash() { cat package-lock.json package.json patches/*.patch 2>/dev/null | sha1sum | cut -c1-16; }

# npm ci when node_modules is missing or was installed from another lock file.
ensure_node_modules() {
  local want have=""
  want=$(lock_hash)
  [ -f node_modules/.rootbench-lock ] && have=$(cat node_modules/.rootbench-lock)
  if [ ! -d node_modules ] || [ "$want" != "$have" ]; then
    echo "[setup] installing packages (npm ci)"
    npm ci --no-audit --no-fund --loglevel=error
    echo "$want" > node_modules/.rootbench-lock
  fi
}

# next build when there is no build or any source file is newer than it.
ensure_build() {
  if [ -f .next/BUILD_ID ] && [ -z "$(find app components lib db content public next.config.ts tailwind.config.ts package-lock.json \
        -newer .next/BUILD_ID -type f -print -quit 2>/dev/null)" ]; then
    return 0
  fi
  echo "[setup] building the app (next build)"
  run_in_group /tmp/rootbench-build.log npx next build || { tail -n 60 /tmp/rootbench-build.log; echo "[setup] build failed"; exit 1; }
}

ensure_chromium() {
  if [ ! -x /usr/bin/chromium ]; then
    echo "[setup] installing Debian's chromium for browser tests"
    if ! DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends chromium >/tmp/rootbench-apt.log 2>&1; then
      apt-get update >>/tmp/rootbench-apt.log 2>&1
      DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends chromium >>/tmp/rootbench-apt.log 2>&1
    fi
  fi
}

# The job-card test turns the printed PDF into an image with Debian's poppler-utils.
ensure_poppler() {
  if ! command -v pdftoppm >/dev/null 2>&1; then
    echo "[setup] installing Debian's poppler-utils for the job-card test"
    if ! DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends poppler-utils >/tmp/rootbench-apt.log 2>&1; then
      apt-get update >>/tmp/rootbench-apt.log 2>&1
      DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends poppler-utils >>/tmp/rootbench-apt.log 2>&1
    fi
  fi
}

db_url_for() { # cluster port name
  echo "postgres://rootbench:${DB_PASSWORD:-rootbench}@127.0.0.1:$2/$3"
}

wait_for_http() { # url seconds
  local url=$1 seconds=${2:-60}
  for _ in $(seq 1 $((seconds * 4))); do
    curl -fsS -o /dev/null "$url" 2>/dev/null && return 0
    sleep 0.25
  done
  return 1
}
export VITE_CONFIG_NATIVE_IGNORE_WARNING=true

# ---- processes a script starts, and the ports they take ----
# Every server a script starts goes through start_bg, in a process group of its own, so that
# stop_started ends it with everything it spawned (npx -> tsx -> node). A test cluster the script
# had to start is stopped again. Scripts call `stop_on_exit` once; it covers Ctrl-C and kill too.
STARTED_PIDS=()
STARTED_CLUSTERS=()

start_bg() { # log-file command…   (the pid is in $!)
  local log=$1; shift
  setsid "$@" >"$log" 2>&1 </dev/null &
  STARTED_PIDS+=($!)
}

# A long foreground step (a build) in its own process group, so a kill of the script stops it too.
run_in_group() { # log-file command…
  local rc=0
  start_bg "$@"
  wait $! || rc=$?
  unset 'STARTED_PIDS[-1]'
  return $rc
}

stop_started() {
  local pid i
  for ((i = ${#STARTED_PIDS[@]} - 1; i >= 0; i--)); do
    pid=${STARTED_PIDS[$i]}
    kill -TERM -- "-$pid" 2>/dev/null || kill -TERM "$pid" 2>/dev/null || true
  done
  for pid in "${STARTED_PIDS[@]}"; do
    for _ in $(seq 1 40); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
    kill -KILL -- "-$pid" 2>/dev/null || true
  done
  STARTED_PIDS=()
  for cluster in "${STARTED_CLUSTERS[@]}"; do
    DB_CLUSTER=$cluster bash scripts/db.sh stop >/dev/null 2>&1 || true
  done
  STARTED_CLUSTERS=()
}

stop_on_exit() {
  trap stop_started EXIT
  trap 'exit 130' INT
  trap 'exit 143' TERM
}

# Starts the cluster named by DB_CLUSTER unless it runs already (then it is someone's to keep),
# and exports DB_PORT as the port it listens on.
start_cluster() {
  if ! bash scripts/db.sh status >/dev/null 2>&1; then STARTED_CLUSTERS+=("$DB_CLUSTER"); fi
  bash scripts/db.sh start >/dev/null
  DB_PORT=$(bash scripts/db.sh port)
  export DB_PORT
}

port_in_use() { ss -Htln "sport = :$1" 2>/dev/null | grep -q .; }

# Who listens on a port, in words: the program, its pid, how long it has run, and where it runs
# from (for PostgreSQL that is its data directory, i.e. which checkout it belongs to).
port_holder() {
  local line pid
  line=$(ss -Htlnp "sport = :$1" 2>/dev/null | head -n 1)
  pid=$(echo "$line" | grep -o 'pid=[0-9]*' | head -n 1 | cut -d= -f2)
  if [ -n "$pid" ]; then
    echo "$(ps -o comm= -p "$pid") (pid $pid, running $(ps -o etime= -p "$pid" | tr -d ' '), in $(readlink "/proc/$pid/cwd" 2>/dev/null || echo '?'))"
  else
    echo "a process this user cannot see"
  fi
}

# pick_port NAME DEFAULT: exports NAME as a free port. A port given in the environment must be
# free (or the script says what holds it and stops); the default moves to the next free port.
pick_port() {
  local name=$1 default=$2 given=${!1:-} port
  if [ -n "$given" ]; then
    if port_in_use "$given"; then
      echo "[setup] $name=$given is taken by $(port_holder "$given"); stop that or set $name to a free port" >&2
      exit 1
    fi
    export "$name=$given"
    return
  fi
  port=$default
  while port_in_use "$port"; do port=$((port + 1)); done
  [ "$port" = "$default" ] || echo "[setup] port $default is taken by $(port_holder "$default"); using $port for $name"
  export "$name=$port"
}
