#!/usr/bin/env bash
# npm run bench: every benchmark of issue 15 with its baseline measured in the same run, then
# the table. Its own database (linkyard_bench, rebuilt from empty with the demo data and the
# bench organisations of bench/seed.ts), its own production server on LINKYARD_BENCH_PORT
# (default LINKYARD_TEST_PORT + 2; the bare baseline takes the next port), trusting 127.0.0.1
# as its proxy; all traffic on 127.0.0.1; each run is bounded in time and connections. Not
# part of npm test. Services it started are stopped at the end.
# `npm run bench -- api.ts page-weight.ts` runs only those scripts (the set-up still happens).
source "$(dirname "$0")/../scripts/lib.sh"
# Beside the test server's port by default, so that clones with their own LINKYARD_TEST_PORT never meet.
BENCH_PORT="${LINKYARD_BENCH_PORT:-$(( ${LINKYARD_TEST_PORT:-3100} + 2 ))}"

ensure_node_modules
ensure_chromium
find_pg_bin; choose_pgdata
started=()
pg_running || started+=(postgres)
mail_running || started+=(mail)
s3_running || started+=(s3)
stop_started() {
  stop_pid_file "$DATA/bench-app.pid" server.mts
  for s in "${started[@]}"; do "stop_$s" >/dev/null; done
}
trap stop_started EXIT
start_postgres
ensure_database linkyard_bench
start_mail
start_s3

export DATABASE_URL="$(database_url linkyard_bench)"
export_service_env
export APP_URL="http://127.0.0.1:$BENCH_PORT"
export LINKYARD_BENCH_URL="$APP_URL" LINKYARD_BASE_URL="$APP_URL"
export PSQL="$PG_BIN/psql"

say "rebuilding the bench database (demo data and the bench organisations)"
knex_cli migrate:latest >/dev/null
knex_cli migrate:rollback --all >/dev/null
knex_cli migrate:latest >/dev/null
knex_cli seed:run >/dev/null
(cd "$ROOT" && node --import tsx bench/seed.ts)

build_if_stale
export TRUSTED_PROXIES="127.0.0.1"
# A fresh server process: the import's memory is measured on one that has not just carried
# the load runs (whose heap V8 keeps long after), so that its peak is the import's own.
serve() {
  stop_pid_file "$DATA/bench-app.pid" server.mts
  for _ in $(seq 1 50); do port_taken "$BENCH_PORT" || break; sleep 0.2; done
  if port_taken "$BENCH_PORT"; then
    say "port $BENCH_PORT is taken by a program that is not this bench's server; set LINKYARD_BENCH_PORT to a free port"
    exit 1
  fi
  say "serving the build on $APP_URL for the benchmarks"
  (cd "$ROOT"; nohup "${APP_SERVER[@]}" -H 127.0.0.1 -p "$BENCH_PORT" >>"$DATA/bench-app.log" 2>&1 & echo $! >"$DATA/bench-app.pid")
  wait_for_http "$APP_URL/api/health" "$DATA/bench-app.log"
}
: >"$DATA/bench-app.log"
serve

cd "$ROOT"
bench() { say "bench/$1"; node --import tsx "bench/$@"; }
say "machine: $(nproc) cores, $(free -m | awk '/^Mem:/ {print $2}') MB memory, node $(node -v); load average$(uptime | sed 's/.*load average//')"
if [ $# -gt 0 ]; then
  for script in "$@"; do
    if [ "$script" = import.ts ]; then serve; fi
    bench "$script" --record
  done
  node --import tsx bench/table.ts
  exit 0
fi
bench kit-proposal.ts --record
bench securement.ts --record
bench api.ts
bench tag-sheet.ts
bench page-weight.ts --record
serve
bench import.ts --record
bench explain.ts --record
# Figures without a target in the issue, kept from earlier work:
bench stock-list.ts
bench kit-proposal-api.ts
bench account-answers.ts
say "bench/mail-window.ts"; BENCH_MESSAGES=100 node --conditions=react-server --import tsx bench/mail-window.ts
say "load average at the end$(uptime | sed 's/.*load average//')"
node --import tsx bench/table.ts
