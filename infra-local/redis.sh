#!/usr/bin/env bash
# Debian's Redis on 127.0.0.1:$REDIS_PORT, in the foreground, nothing written to disk.
# Only needed when the server runs as several processes (REDIS_URL switches the adapter on).
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"
command -v redis-server >/dev/null 2>&1 || apt_install redis-server
require_free_port "$REDIS_PORT" Redis REDIS_PORT
say "Redis on 127.0.0.1:$REDIS_PORT"
exec redis-server --bind 127.0.0.1 --port "$REDIS_PORT" --save '' --appendonly no --protected-mode yes
