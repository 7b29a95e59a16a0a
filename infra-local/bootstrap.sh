#!/usr/bin/env bash
# Node.js check, pnpm (bootstrapped with plain npm, not corepack) and the workspace's packages.
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"
PNPM_VERSION=12.4.2

node -e 'const [a,b]=process.versions.node.split(".").map(Number); process.exit(a>20||(a===20&&b>=19)?0:1)' ||
  die "Vatside needs Node.js 20.19 or newer; this is $(node -v)."

if [ "$(pnpm --version 2>/dev/null)" != "$PNPM_VERSION" ]; then
  say "Installing pnpm $PNPM_VERSION with npm"
  npm install -g --no-fund --no-audit "pnpm@$PNPM_VERSION" >"$VATSIDE_LOG_DIR/pnpm-install.log" 2>&1 ||
    die "Installing pnpm failed; see $VATSIDE_LOG_DIR/pnpm-install.log"
  hash -r
fi

cd "$VATSIDE_ROOT"
say "Installing the workspace's packages (pnpm install)"
pnpm install --frozen-lockfile --reporter=silent >"$VATSIDE_LOG_DIR/pnpm-install.log" 2>&1 ||
  { tail -n 30 "$VATSIDE_LOG_DIR/pnpm-install.log" >&2; die "pnpm install failed; the full log is $VATSIDE_LOG_DIR/pnpm-install.log"; }
