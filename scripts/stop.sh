#!/usr/bin/env bash
# npm run stop: stop the app, the job worker, the mail and file fakes and PostgreSQL started by npm start.
source "$(dirname "$0")/lib.sh"
stop_pid_file "$DATA/app.pid" server.mts
stop_pid_file "$DATA/test-app.pid" server.mts
stop_worker worker
stop_worker test-worker
stop_pid_file "$DATA/maildev.pid" maildev
stop_pid_file "$DATA/s3rver.pid" s3rver
find_pg_bin; choose_pgdata
if pg_running; then as_pg "$PG_BIN/pg_ctl" -D "$PGDATA" -w stop -m fast >/dev/null; say "PostgreSQL stopped"; fi
say "stopped"
