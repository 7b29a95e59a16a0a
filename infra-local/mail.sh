#!/usr/bin/env bash
# The local mail catcher (maildev 2.x): SMTP on 127.0.0.1:$SMTP_PORT, inbox and REST API
# on $MAIL_INBOX_URL, in the foreground. Nothing is relayed onward.
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"
cd "$VATSIDE_ROOT"
[ -x node_modules/.bin/maildev ] || die "maildev is not installed; run 'pnpm install' at the repository root first"
require_free_port "$SMTP_PORT" "mail catcher SMTP" SMTP_PORT
require_free_port "$MAIL_WEB_PORT" "mail catcher inbox" MAIL_WEB_PORT
mkdir -p "$VATSIDE_DATA_DIR/mail"
say "Mail catcher: SMTP 127.0.0.1:$SMTP_PORT, inbox $MAIL_INBOX_URL"
exec node_modules/.bin/maildev --silent --ip 127.0.0.1 --web-ip 127.0.0.1 \
  --smtp "$SMTP_PORT" --web "$MAIL_WEB_PORT" --mail-directory "$VATSIDE_DATA_DIR/mail"
