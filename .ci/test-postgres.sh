#!/usr/bin/env bash
# The backend e2e suite (or the command given) against a throwaway PostgreSQL cluster:
#   bash .ci/test-postgres.sh                         # every backend e2e spec on PostgreSQL
#   bash .ci/test-postgres.sh npx jest test/auth.e2e-spec.ts   # (run from backend/) one spec
# Installs Debian's postgresql when it is missing (as root with apt-get, like the chromium check),
# runs initdb + pg_ctl as an unprivileged user in a temporary folder, on a free port, with trust
# authentication on 127.0.0.1 only, exports DATABASE_URL for the command, and stops the cluster
# and removes the folder on exit, whatever happens.
set -euo pipefail
repo="$(cd "$(dirname "$0")/.." && pwd)"

find_bin() { ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1; }
bin="$(find_bin)"
if [ -z "$bin" ] || [ ! -x "$bin/initdb" ]; then
  if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null 2>&1; then
    echo "Installing Debian's postgresql for the PostgreSQL test pass (about 30 s)..."
    apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends postgresql >/dev/null
    bin="$(find_bin)"
  else
    echo "The PostgreSQL test pass needs Debian's postgresql (initdb, pg_ctl). Install it with:" >&2
    echo "  sudo apt-get update && sudo apt-get install -y --no-install-recommends postgresql" >&2
    exit 1
  fi
fi

# initdb refuses to run as root: run the cluster as the `postgres` user the package creates.
run_as=()
if [ "$(id -u)" = "0" ]; then
  if ! id postgres >/dev/null 2>&1; then useradd --system --no-create-home --shell /usr/sbin/nologin postgres; fi
  run_as=(runuser -u postgres --)
fi

dir="$(mktemp -d "${TMPDIR:-/tmp}/thermbay-pg.XXXXXX")"
chmod 700 "$dir"
if [ "$(id -u)" = "0" ]; then chown postgres "$dir"; fi
port="$(node -e "const s=require('net').createServer();s.listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})")"

stop_cluster() {
  if [ -f "$dir/data/postmaster.pid" ]; then
    ${run_as[@]+"${run_as[@]}"} "$bin/pg_ctl" -D "$dir/data" -m immediate -w stop >/dev/null 2>&1 || true
  fi
  rm -rf "$dir"
}
trap stop_cluster EXIT
trap "exit 130" INT TERM

${run_as[@]+"${run_as[@]}"} "$bin/initdb" -D "$dir/data" -U thermbay --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
# Trust only local connections on the loopback address (and the socket inside the temp folder).
cat >"$dir/data/pg_hba.conf" <<HBA
local all all trust
host  all all 127.0.0.1/32 trust
HBA
if [ "$(id -u)" = "0" ]; then chown postgres "$dir/data/pg_hba.conf"; fi
# A throwaway cluster: durability settings off for speed.
${run_as[@]+"${run_as[@]}"} "$bin/pg_ctl" -D "$dir/data" -l "$dir/server.log" -w -t 60 \
  -o "-p $port -c listen_addresses=127.0.0.1 -k $dir -c fsync=off -c synchronous_commit=off -c full_page_writes=off -c max_connections=200" \
  start >/dev/null
${run_as[@]+"${run_as[@]}"} "$bin/createdb" -h 127.0.0.1 -p "$port" -U thermbay thermbay

export DATABASE_URL="postgres://thermbay@127.0.0.1:$port/thermbay"
echo "== PostgreSQL $("$bin/postgres" --version | awk '{print $3}') on 127.0.0.1:$port (throwaway cluster in $dir)"
if [ "$#" -gt 0 ]; then
  "$@"
else
  cd "$repo" && npm run test:e2e -w @thermbay/backend
fi
