#!/usr/bin/env bash
# npm test: its own set-up (PostgreSQL, a separate test database rebuilt from empty, the
# mail fake, Chromium, a production build served on its own port, a job worker), then every
# test. It ends with the services it started stopped again (a machine is left as it was
# found; the next run starts them in a few seconds); services that were already running
# (npm start, npm run dev) are left running.
source "$(dirname "$0")/lib.sh"
TEST_PORT="${LINKYARD_TEST_PORT:-3100}"

ensure_node_modules

# The linter first: a problem it finds is cheaper to read than a failing test.
say "linting (npm run lint)"
(cd "$ROOT" && npm run --silent lint) || { say "the linter found problems (above); nothing was tested"; exit 1; }

ensure_chromium
ensure_pdf_tools
find_pg_bin; choose_pgdata
started=()
pg_running || started+=(postgres)
mail_running || started+=(mail)
s3_running || started+=(s3)
stop_started() {
  stop_pid_file "$DATA/test-app.pid" server.mts
  stop_worker test-worker
  for s in "${started[@]}"; do "stop_$s" >/dev/null; done
  if [ ${#started[@]} -gt 0 ]; then say "stopped what the tests started: ${started[*]}"; fi
}
trap stop_started EXIT
start_postgres
ensure_database linkyard_test
start_mail
start_s3

export DATABASE_URL="$(database_url linkyard_test)"
export_service_env
export APP_URL="http://127.0.0.1:$TEST_PORT"
export LINKYARD_BASE_URL="$APP_URL"
export MAIL_API="http://127.0.0.1:$MAIL_WEB_PORT"
# The e-mail queue's retries, shortened: the fault tests stop the mail fake and wait for
# retries (1-2 s, 2-4 s, 4-8 s) and for a message to be marked failed after the last.
export MAIL_RETRY_DELAY_SECONDS=1 MAIL_RETRY_LIMIT=3 JOB_POLL_SECONDS=0.5

# A worker of an earlier run must not hold the queue while its tables are rebuilt.
stop_worker test-worker

# Down to empty and up again: proves every migration's rollback as well as its forward run.
say "resetting the test database"
knex_cli migrate:latest >/dev/null
knex_cli migrate:rollback --all >/dev/null
knex_cli migrate:latest >/dev/null
knex_cli seed:run >/dev/null

build_if_stale

# The tests stand in for a reverse proxy on 127.0.0.1 (their clients report addresses of
# their own in X-Forwarded-For); any other loopback address is a direct, untrusted caller.
export TRUSTED_PROXIES="127.0.0.1"
say "serving the build on $APP_URL for the tests"
stop_pid_file "$DATA/test-app.pid" server.mts
(cd "$ROOT"; nohup "${APP_SERVER[@]}" -H 127.0.0.1 -p "$TEST_PORT" >"$DATA/test-app.log" 2>&1 & echo $! >"$DATA/test-app.pid")
start_worker test-worker
wait_for_http "$APP_URL/api/health" "$DATA/test-app.log"

cd "$ROOT"
status=0
node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile.json="$DATA/vitest.json" "$@" || status=$?
trap - EXIT
stop_started
# A plain closing line that any CI can read.
node -e 'const r=require(process.argv[1]);console.log(`Tests: ${r.numPassedTests} passed, ${r.numFailedTests} failed, ${r.numPendingTests+r.numTodoTests} skipped`)' "$DATA/vitest.json" || true
exit $status
