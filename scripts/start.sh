#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL and the mail fake on loopback,
# migrate, load the demo data into an empty database, build and serve.
source "$(dirname "$0")/lib.sh"
PORT="${PORT:-3000}"

ensure_node_modules
start_postgres
ensure_database linkyard
start_mail
start_s3

export DATABASE_URL="${DATABASE_URL:-$(database_url linkyard)}"
export_service_env
export APP_URL="${APP_URL:-http://127.0.0.1:$PORT}"

say "applying migrations"
knex_cli migrate:latest >/dev/null
if [ "$(cd "$ROOT" && node --import tsx scripts/db-is-empty.ts)" = "empty" ]; then
  say "loading the demo data"
  knex_cli seed:run >/dev/null
fi

build_if_stale

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
exec node_modules/.bin/next start -H 127.0.0.1 -p "$PORT"
