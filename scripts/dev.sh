#!/usr/bin/env bash
# npm run dev: the database, migrations and seed, then Next's dev server with hot reload.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/common.sh
ensure_node_modules
bash scripts/db.sh start
export DB_PORT=${DB_PORT:-54329}
export DATABASE_URL=${DATABASE_URL:-$(db_url_for app "$DB_PORT" rootbench)}
npx tsx --conditions=react-server db/migrate.ts
npx tsx --conditions=react-server db/seed/index.ts
exec npx next dev -p "${PORT:-3000}"
