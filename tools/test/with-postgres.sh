#!/usr/bin/env bash
# Runs a command against a private, throwaway PostgreSQL cluster on 127.0.0.1 (Debian's postgresql
# package), exported to it as TEST_DATABASE_URL; the cluster is removed afterwards.
set -euo pipefail

bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
if [ -z "$bin" ] || [ ! -x "$bin/initdb" ]; then
  echo "PostgreSQL server binaries not found: apt-get install -y postgresql" >&2
  exit 1
fi

work=$(mktemp -d /tmp/tressury-pg.XXXXXX)
# A free port, so several runs can share the machine.
port=${TRESSURY_TEST_PG_PORT:-$(node -e "const s=require('net').createServer().listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})")}
run_as=()
if [ "$(id -u)" = "0" ]; then
  chown postgres: "$work"
  run_as=(runuser -u postgres --)
fi

cleanup() {
  "${run_as[@]}" "$bin/pg_ctl" -D "$work/data" -m immediate stop >/dev/null 2>&1 || true
  rm -rf "$work"
}
trap cleanup EXIT

"${run_as[@]}" "$bin/initdb" -D "$work/data" -U postgres --auth=trust >"$work/initdb.log" 2>&1 || { cat "$work/initdb.log" >&2; exit 1; }
"${run_as[@]}" "$bin/pg_ctl" -D "$work/data" -l "$work/server.log" -w \
  -o "-c listen_addresses=127.0.0.1 -p $port -k $work -c fsync=off" start >/dev/null || { cat "$work/server.log" >&2; exit 1; }

export TEST_DATABASE_URL="postgresql://postgres@127.0.0.1:$port/postgres"
echo "PostgreSQL $("$bin/postgres" --version | awk '{print $3}') on 127.0.0.1:$port for: $*"
"$@"
