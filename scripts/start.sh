#!/usr/bin/env bash
# npm start: install what is missing, start MariaDB + fake mail + the app, print where to go.
set -euo pipefail
source "$(dirname "$0")/setup.sh"
cd "$TP_ROOT"

PORT="${PORT:-3000}"
MAIL_SMTP_PORT="${MAIL_SMTP_PORT:-1025}"
MAIL_WEB_PORT="${MAIL_WEB_PORT:-1080}"
export DATABASE_URL="${DATABASE_URL:-$(tp_db_url touchproof)}"

tp_ensure_node_modules
tp_db_start

tp_log "applying migrations"
node --import tsx scripts/migrate.ts
tp_log "seeding the demo (idempotent)"
node --import tsx scripts/seed.ts
tp_log "building the client"
npx vite build --logLevel warn

# Fake mail service, loopback only. Reused when already running.
if [ -f "$TP_DATA/maildev.pid" ] && kill -0 "$(cat "$TP_DATA/maildev.pid")" 2>/dev/null; then
  tp_log "fake mail service already running"
else
  if tp_port_in_use "$MAIL_SMTP_PORT"; then tp_log "port $MAIL_SMTP_PORT is taken; cannot start the fake mail service"; exit 1; fi
  setsid nohup node node_modules/maildev/dist/bin/maildev.js --ip 127.0.0.1 --web-ip 127.0.0.1 \
    --smtp "$MAIL_SMTP_PORT" --web "$MAIL_WEB_PORT" --silent >"$TP_DATA/maildev.log" 2>&1 </dev/null &
  echo $! > "$TP_DATA/maildev.pid"
fi

# The app server is restarted so a new build is always what is served.
tp_stop_pidfile "$TP_DATA/server.pid" "app server"
if tp_port_in_use "$PORT"; then tp_log "port $PORT is taken by another program; set PORT=... and retry"; exit 1; fi
PORT="$PORT" HOST=127.0.0.1 SMTP_HOST=127.0.0.1 SMTP_PORT="$MAIL_SMTP_PORT" \
  PUBLIC_URL="${PUBLIC_URL:-http://127.0.0.1:$PORT}" \
  setsid nohup node --import tsx server/index.ts >>"$TP_DATA/server.log" 2>&1 </dev/null &
echo $! > "$TP_DATA/server.pid"
if ! tp_wait_http "http://127.0.0.1:$PORT/api/health" 150; then
  tp_log "the app did not answer; last lines of .data/server.log:"; tail -n 30 "$TP_DATA/server.log" >&2; exit 1
fi

cat <<MSG

  Touchproof is running.
    App            http://127.0.0.1:$PORT
    Mail inbox     http://127.0.0.1:$MAIL_WEB_PORT   (fake: invitation and reset mails land here)
    MariaDB        127.0.0.1:$TP_DB_PORT (data in .data/)

  Demo sign-ins (demo only), password: touchproof-demo
    admin@tidewater.example       admin
    designer@tidewater.example    designer
    designer2@tidewater.example   designer
    reviewer@tidewater.example    reviewer
    trainee@tidewater.example     trainee

  Stop everything with: npm run stop
MSG
