# Shared steps of start.sh, test.sh and dev.sh (sourced, not run).
export NEXT_TELEMETRY_DISABLED=1

lock_hash() { sha1sum package-lock.json package.json | sha1sum | cut -c1-16; }

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
  npx next build >/tmp/rootbench-build.log 2>&1 || { tail -n 60 /tmp/rootbench-build.log; echo "[setup] build failed"; exit 1; }
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
