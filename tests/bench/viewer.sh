#!/usr/bin/env bash
# pnpm bench:viewer [--runs N]: the viewer's phone benchmark. Builds the apps, seeds the invented
# demo studio into a fresh database of its own (never the demo's or the tests'; fresh, so its
# images are in the object store this run uses), starts the object store and mail catcher if they
# are not running (stopped again after), then measures each route.
export VATSIDE_PROFILE=test
export PG_DATABASE="${PG_DATABASE:-vatside_viewer_bench}"
source "$(dirname "${BASH_SOURCE[0]}")/../../infra-local/env.sh"
[ -x /usr/bin/chromium ] || apt_install chromium
bash "$VATSIDE_ROOT/infra-local/postgres.sh" reset-db
pids=()
trap 'for p in "${pids[@]}"; do kill "$p" 2>/dev/null; done' EXIT
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
cd "$VATSIDE_ROOT"
pnpm --silent --filter @vatside/db run migrate || die "Applying migrations failed"
(cd apps/server && node --import tsx src/seed-cli.ts >/dev/null) || die "Seeding the demo data failed"
say "Building the console and viewer apps"
pnpm --silent run build >"$VATSIDE_LOG_DIR/build.log" 2>&1 ||
  { tail -n 30 "$VATSIDE_LOG_DIR/build.log" >&2; die "Building the apps failed; see $VATSIDE_LOG_DIR/build.log"; }
cd "$VATSIDE_ROOT/tests" && node --import tsx bench/viewer.bench.ts "$@"
