#!/usr/bin/env bash
# npm run dev: the local services (PostgreSQL, the mail fake, the file-storage fake), the
# migrations and the demo data as npm start has them, then `next dev` on PORT (default
# 3000), which reloads as files change, behind the same server.mts as npm start. Stop the services with `npm run stop`.
source "$(dirname "$0")/lib.sh"
PORT="${PORT:-3000}"

prepare_local_app "$PORT"
start_worker worker

say "next dev on $APP_URL (mail inbox: http://127.0.0.1:$MAIL_WEB_PORT); Ctrl-C stops it, npm run stop stops the services"
cd "$ROOT"
exec node --import tsx server.mts --dev -H 127.0.0.1 -p "$PORT"
