#!/usr/bin/env bash
# Several Boothwright instances on one PostgreSQL database, with HAProxy in front: one instance
# per `server` line of deploy/haproxy.cfg (or $HAPROXY_CONFIG), on that line's port. Migrates
# once, builds the client if it is missing, and stops everything when one process stops or on
# Ctrl-C. Needs Debian's haproxy package.
#
#   DATABASE_URL=postgres://… SESSION_SECRET=… S3_BUCKET=… bash deploy/run-instances.sh
set -euo pipefail
cd "$(dirname "$0")/.."

: "${DATABASE_URL:?Set DATABASE_URL to the shared PostgreSQL database}"
: "${SESSION_SECRET:?Set SESSION_SECRET, the same for every instance (16+ characters)}"
if [ -z "${S3_BUCKET:-}" ]; then echo "warning: S3_BUCKET is not set, so each instance keeps uploads on its own disk" >&2; fi
if [ -z "${SMTP_URL:-}" ]; then echo "warning: SMTP_URL is not set, so each instance has its own development mailbox" >&2; fi
command -v haproxy >/dev/null || { echo "haproxy is not installed (apt-get install haproxy)" >&2; exit 1; }

config="${HAPROXY_CONFIG:-deploy/haproxy.cfg}"
haproxy -c -q -f "$config"
ports="$(awk '$1 == "server" { n = split($3, hostPort, ":"); print hostPort[n] }' "$config")"
[ -n "$ports" ] || { echo "no server lines in $config" >&2; exit 1; }

[ -f dist/client/index.html ] && [ -f dist-server/index.js ] || npm run build
node dist-server/cli.js migrate

pids=()
stop_all() {
  trap - EXIT INT TERM
  kill "${pids[@]}" 2>/dev/null || true
  wait || true
}
trap stop_all EXIT INT TERM

for port in $ports; do
  # The built server under Node itself, not a wrapper, so the stop signal reaches the server.
  PORT="$port" NODE_ENV=production TRUST_PROXY=true node --max-old-space-size=256 dist-server/index.js &
  pids+=("$!")
done
haproxy -db -f "$config" &
pids+=("$!")
echo "Boothwright: $(wc -w <<<"$ports") instances behind http://localhost:${LB_PORT:-8080}"
wait -n
