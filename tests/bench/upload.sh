#!/usr/bin/env bash
# pnpm bench:upload [--shares N]: the upload benchmark on the test profile's database, object
# store and mail catcher (each started here if it is not running, and stopped again after).
export VATSIDE_PROFILE=test
source "$(dirname "${BASH_SOURCE[0]}")/../../infra-local/env.sh"
bash "$VATSIDE_ROOT/infra-local/postgres.sh" start
pids=()
trap 'for p in "${pids[@]}"; do kill "$p" 2>/dev/null; done' EXIT
mkdir -p "$VATSIDE_LOG_DIR"
if ! port_in_use "$S3_PORT"; then
  bash "$VATSIDE_ROOT/infra-local/object-store.sh" >"$VATSIDE_LOG_DIR/object-store.log" 2>&1 &
  pids+=($!)
  wait_for_port "$S3_PORT" "The object store"
fi
if ! port_in_use "$SMTP_PORT"; then
  bash "$VATSIDE_ROOT/infra-local/mail.sh" >"$VATSIDE_LOG_DIR/mail.log" 2>&1 &
  pids+=($!)
  wait_for_port "$SMTP_PORT" "The mail catcher (SMTP)"
  wait_for_port "$MAIL_WEB_PORT" "The mail catcher (inbox)"
fi
(cd "$VATSIDE_ROOT" && pnpm --silent --filter @vatside/db run migrate) || die "Applying migrations failed"
cd "$VATSIDE_ROOT/tests" && node --import tsx bench/upload.bench.ts "$@"
