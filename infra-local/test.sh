#!/usr/bin/env bash
# npm test: the same set-up as npm start on the test profile's own ports and database
# (never the demo data), then every check and test; exits non-zero on any failure.
export VATSIDE_PROFILE=test
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"
started=$(date +%s)
bash "$VATSIDE_ROOT/infra-local/bootstrap.sh"
[ -x /usr/bin/chromium ] || apt_install chromium
# The scale-out test starts its own Redis; only the binary is needed.
command -v redis-server >/dev/null 2>&1 || apt_install redis-server
source "$VATSIDE_ROOT/infra-local/services.sh"
trap 'stop_services' EXIT
trap 'exit 130' INT TERM
cd "$VATSIDE_ROOT"

if [ -z "${VATSIDE_SKIP_STATIC_CHECKS:-}" ]; then
  say "Static checks: formatting, lint, types"
  pnpm --silent run format:check || die "Formatting differs; run 'pnpm format'"
  pnpm --silent run lint || die "Lint failed"
  pnpm --silent run typecheck || die "Type check failed"
fi

# A clean slate every run: empty database, empty bucket, empty inbox.
rm -rf "$VATSIDE_DATA_DIR/s3" "$VATSIDE_DATA_DIR/mail"
start_services
bash infra-local/postgres.sh reset-db
migrate_database
build_apps
# End-to-end tests sign many people up from 127.0.0.1; the limiter has its own integration test.
export AUTH_ATTEMPTS_PER_MINUTE=1000
start_app_server

say "Running every test (unit, component, integration, end-to-end)"
export VATSIDE_TEST_RESULTS="$VATSIDE_ROOT/.local/test/results"
rm -rf "$VATSIDE_TEST_RESULTS" && mkdir -p "$VATSIDE_TEST_RESULTS"
status=0
say "Set-up took $(($(date +%s) - started)) s"
# Arguments narrow the run while working, e.g. `npm test -- apps/server/src/routes/review.test.ts`.
pnpm exec vitest run "$@" --reporter=default --reporter=json \
  --outputFile.json="$VATSIDE_TEST_RESULTS/vitest.json" || status=$?

echo "[vatside] npm test took $(($(date +%s) - started)) s"
# One plain closing line that any reader of the log understands.
node -e '
  const r = JSON.parse(require("fs").readFileSync(process.argv[1], "utf8"));
  // A file whose set-up failed runs no test: it counts as failed here, not only as skipped.
  const files = r.testResults.filter((t) => t.status === "failed").length;
  const broken = files ? `, ${files} files failed` : "";
  console.log(`vitest: ${r.numPassedTests} passed, ${r.numFailedTests} failed, ${r.numPendingTests + r.numTodoTests} skipped${broken}`);
' "$VATSIDE_TEST_RESULTS/vitest.json" || status=1
exit "$status"
