#!/usr/bin/env bash
# Starts PostgreSQL, the object store and the mail catcher for the current profile and
# stops them again when the calling script exits. Sourced by start.sh and test.sh.
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"

VATSIDE_CHILD_PIDS=()

stop_services() {
  local pid
  for pid in "${VATSIDE_CHILD_PIDS[@]}"; do kill "$pid" 2>/dev/null || true; done
  for pid in "${VATSIDE_CHILD_PIDS[@]}"; do wait "$pid" 2>/dev/null || true; done
  bash "$VATSIDE_ROOT/infra-local/postgres.sh" stop || true
}

# Runs a script in the background with its output in the log folder.
run_in_background() {
  local name=$1
  shift
  "$@" >"$VATSIDE_LOG_DIR/$name.log" 2>&1 &
  VATSIDE_CHILD_PIDS+=("$!")
}

start_services() {
  bash "$VATSIDE_ROOT/infra-local/postgres.sh" start
  run_in_background object-store bash "$VATSIDE_ROOT/infra-local/object-store.sh"
  run_in_background mail bash "$VATSIDE_ROOT/infra-local/mail.sh"
  wait_for_port "$S3_PORT" "The object store"
  wait_for_port "$SMTP_PORT" "The mail catcher (SMTP)"
  wait_for_port "$MAIL_WEB_PORT" "The mail catcher (inbox)"
  say "Object store on $S3_ENDPOINT, mail catcher inbox on $MAIL_INBOX_URL"
}

migrate_database() {
  (cd "$VATSIDE_ROOT" && pnpm --silent --filter @vatside/db run migrate) || die "Applying migrations failed"
}

build_apps() {
  say "Building the console and viewer apps"
  (cd "$VATSIDE_ROOT" && pnpm --silent run build >"$VATSIDE_LOG_DIR/build.log" 2>&1) ||
    { tail -n 30 "$VATSIDE_LOG_DIR/build.log" >&2; die "Building the apps failed; see $VATSIDE_LOG_DIR/build.log"; }
}

start_app_server() {
  require_free_port "$APP_PORT" "the Vatside server" APP_PORT
  export APPS_DIR="$VATSIDE_ROOT/apps"
  run_in_background server bash "$VATSIDE_ROOT/apps/server/serve.sh"
  wait_for_port "$APP_PORT" "The Vatside server" 240
}
