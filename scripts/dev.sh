#!/usr/bin/env bash
# npm run dev: API server with reload on :3001 and Vite's dev server on :5173 (proxying /api, /fonts).
set -euo pipefail
source "$(dirname "$0")/setup.sh"
cd "$TP_ROOT"
export DATABASE_URL="${DATABASE_URL:-$(tp_db_url touchproof)}"
export DEV_API_PORT="${DEV_API_PORT:-3001}"
tp_ensure_node_modules
tp_db_start
node --import tsx scripts/migrate.ts
node --import tsx scripts/seed.ts
PORT="$DEV_API_PORT" HOST=127.0.0.1 PUBLIC_URL="http://127.0.0.1:5173" SERVE_CLIENT=false \
  node --import tsx --watch server/index.ts &
api_pid=$!
trap 'kill $api_pid 2>/dev/null || true' EXIT INT TERM
npx vite --host 127.0.0.1 --port 5173
