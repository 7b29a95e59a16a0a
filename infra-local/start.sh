#!/usr/bin/env bash
# npm start: install what is missing, start the services, migrate, seed the invented demo
# studio, build and serve the apps. Ctrl-C stops everything this script started.
export VATSIDE_PROFILE=demo
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"
started=$(date +%s)
bash "$VATSIDE_ROOT/infra-local/bootstrap.sh"
source "$VATSIDE_ROOT/infra-local/services.sh"
trap 'echo; say "Stopping"; stop_services; exit 0' INT TERM
trap 'stop_services' EXIT

start_services
migrate_database
demo_sign_ins=$(cd "$VATSIDE_ROOT/apps/server" && node --import tsx src/seed-cli.ts) || die "Seeding the demo data failed"
build_apps
start_app_server

cat <<MSG

  Vatside is running (ready in $(($(date +%s) - started)) s).

    Viewer (phones):   $PUBLIC_ORIGIN/
    Console (host):    $PUBLIC_ORIGIN/console/
    Health:            $PUBLIC_ORIGIN/api/health
    Mail inbox:        $MAIL_INBOX_URL

$demo_sign_ins

  Logs: $VATSIDE_LOG_DIR   Data: $VATSIDE_DATA_DIR
  Press Ctrl-C to stop everything.

MSG
wait -n "${VATSIDE_CHILD_PIDS[@]}" || true
die "A service stopped unexpectedly; see the logs in $VATSIDE_LOG_DIR"
