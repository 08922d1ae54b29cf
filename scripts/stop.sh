#!/usr/bin/env bash
# npm run stop: stop what npm start started (app server, fake mail, MariaDB), by PID.
set -euo pipefail
source "$(dirname "$0")/setup.sh"
tp_stop_pidfile "$TP_DATA/server.pid" "app server"
tp_stop_pidfile "$TP_DATA/maildev.pid" "fake mail service"
if [ -f "$TP_CNF" ] && tp_db_ping; then
  tp_log "stopping MariaDB"
  mariadb-admin --defaults-file="$TP_CNF" shutdown || true
fi
tp_log "stopped"
