#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL and the mail fake on loopback,
# migrate, load the demo data into an empty database, build, start the job worker (e-mail
# and reminders) and serve.
source "$(dirname "$0")/lib.sh"
PORT="${PORT:-3000}"

prepare_local_app "$PORT"
build_if_stale
start_worker worker

cat <<MSG

  Linkyard is at $APP_URL   (mail inbox: http://127.0.0.1:$MAIL_WEB_PORT)

  Demo accounts (demo only), password: yard-demo-2026
    owner      olive@corvid-hollow.example
    planner    pete@corvid-hollow.example
    yard hand  yara@corvid-hollow.example

  Stop everything with: npm run stop

MSG
cd "$ROOT"
echo $$ >"$DATA/app.pid"
exec "${APP_SERVER[@]}" -H 127.0.0.1 -p "$PORT"
