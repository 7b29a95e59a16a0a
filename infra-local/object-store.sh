#!/usr/bin/env bash
# The local S3-compatible store (s3rver) on 127.0.0.1:$S3_PORT, in the foreground.
# Objects live in $VATSIDE_DATA_DIR/s3; the bucket $S3_BUCKET is created at start.
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"
cd "$VATSIDE_ROOT"
[ -x node_modules/.bin/s3rver ] || die "s3rver is not installed; run 'pnpm install' at the repository root first"
require_free_port "$S3_PORT" "object store" S3_PORT
mkdir -p "$VATSIDE_DATA_DIR/s3"
say "Object store on $S3_ENDPOINT (bucket $S3_BUCKET, data in $VATSIDE_DATA_DIR/s3)"
exec node_modules/.bin/s3rver --silent -a 127.0.0.1 -p "$S3_PORT" -d "$VATSIDE_DATA_DIR/s3" \
  --no-vhost-buckets --configure-bucket "$S3_BUCKET"
