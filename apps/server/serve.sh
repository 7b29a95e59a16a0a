#!/usr/bin/env bash
# Starts the server (npm start, the benchmarks, and a deployment alike).
#
# Sharing moves megabyte buffers all the time (photos arriving, decoded pixels, renditions). By
# default glibc maps each large buffer on its own and unmaps it when freed, so every new one pays
# a page fault per 4 KB page. Keeping buffers under 64 MB in the heap, and the heap untrimmed up
# to 256 MB, reuses those pages: bench:upload measured about a quarter less server CPU per share.
# The glibc manual, "Memory Allocation Tunables". Other C libraries ignore the variable.
#
# Arguments are Node's own flags (a benchmark's --cpu-prof); the server itself reads only its
# environment.
cd "$(dirname "${BASH_SOURCE[0]}")"
export GLIBC_TUNABLES="${GLIBC_TUNABLES:-glibc.malloc.mmap_threshold=67108864:glibc.malloc.trim_threshold=268435456}"
exec node "$@" --import tsx src/main.ts
