#!/usr/bin/env bash
# npm run stop: stop the app, the job worker, the mail and file fakes and PostgreSQL started by npm start.
source "$(dirname "$0")/lib.sh"
stop_pid_file "$DATA/app.pid" server.mts
stop_pid_file "$DATA/test-app.pid" server.mts
stop_worker worker
stop_worker test-worker
stop_mail
stop_s3
stop_postgres
say "stopped"
