#!/usr/bin/env bash
# pnpm bench:live [--viewers N]: the live benchmark on the test profile's database and mail
# catcher (started here if they are not running), with room for thousands of open sockets.
export VATSIDE_PROFILE=test
source "$(dirname "${BASH_SOURCE[0]}")/../../infra-local/env.sh"
bash "$VATSIDE_ROOT/infra-local/postgres.sh" start
# The server reports healthy only when every service answers: start what is not running.
started_pids=()
trap 'for pid in "${started_pids[@]}"; do kill "$pid" 2>/dev/null; done' EXIT
if ! port_in_use "$SMTP_PORT"; then
  bash "$VATSIDE_ROOT/infra-local/mail.sh" >"$VATSIDE_LOG_DIR/mail.log" 2>&1 &
  started_pids+=("$!")
  wait_for_port "$SMTP_PORT" "The mail catcher (SMTP)"
  wait_for_port "$MAIL_WEB_PORT" "The mail catcher (inbox)"
fi
if ! port_in_use "$S3_PORT"; then
  bash "$VATSIDE_ROOT/infra-local/object-store.sh" >"$VATSIDE_LOG_DIR/object-store.log" 2>&1 &
  started_pids+=("$!")
  wait_for_port "$S3_PORT" "The object store"
fi
(cd "$VATSIDE_ROOT" && pnpm --silent --filter @vatside/db run migrate) || die "Applying migrations failed"
# Each viewer holds one socket in the server and one here: raise the open-files limit as far
# as this machine allows (65535, or the hard limit when that is lower).
ulimit -n 65535 2>/dev/null || ulimit -n "$(ulimit -Hn)"
say "Open-files limit: $(ulimit -n)"
cd "$VATSIDE_ROOT/tests" && node --import tsx bench/live.bench.ts "$@"
