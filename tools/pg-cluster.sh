#!/usr/bin/env bash
# A throw-away PostgreSQL cluster for the tests: `start DIR` makes one in DIR (initdb as the postgres user, trust
# authentication, loopback only, a free port) and prints its connection string; `stop DIR` stops it and deletes DIR.
# Installs Debian's postgresql package when initdb is missing. No system service is used.
set -euo pipefail
cmd=${1:?usage: pg-cluster.sh start|stop DIR}
dir=${2:?usage: pg-cluster.sh start|stop DIR}

bindir() {
  local d
  for d in /usr/lib/postgresql/*/bin; do [ -x "$d/initdb" ] && { echo "$d"; return; }; done
  return 1
}

case "$cmd" in
start)
  if ! bindir >/dev/null; then
    echo "Installing PostgreSQL (Debian package postgresql)..." >&2
    SUDO=""; [ "$(id -u)" -ne 0 ] && SUDO="sudo"
    $SUDO apt-get update -qq >&2 && DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq postgresql >/dev/null
  fi
  bin=$(bindir)
  port=$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1]); s.close()')
  mkdir -p "$dir"
  run=""; [ "$(id -u)" -eq 0 ] && { chown postgres "$dir"; run="runuser -u postgres --"; }
  $run "$bin/initdb" -D "$dir/data" -U postgres -A trust -E UTF8 --no-locale >"$dir/initdb.log" 2>&1 \
    || { cat "$dir/initdb.log" >&2; exit 1; }
  $run "$bin/pg_ctl" -D "$dir/data" -l "$dir/server.log" -w -t 60 \
    -o "-h 127.0.0.1 -p $port -k $dir -c fsync=off -c synchronous_commit=off -c full_page_writes=off -c max_connections=200" start >&2 \
    || { cat "$dir/server.log" >&2; exit 1; }
  echo "$port" > "$dir/port"
  echo "Host=127.0.0.1;Port=$port;Database=postgres;Username=postgres;Password=unused"
  ;;
stop)
  [ -d "$dir/data" ] || exit 0
  bin=$(bindir)
  run=""; [ "$(id -u)" -eq 0 ] && run="runuser -u postgres --"
  $run "$bin/pg_ctl" -D "$dir/data" -m immediate -w stop >/dev/null 2>&1 || true
  rm -rf "$dir"
  ;;
*) echo "usage: pg-cluster.sh start|stop DIR" >&2; exit 2 ;;
esac
