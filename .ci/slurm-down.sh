#!/usr/bin/env bash
# Stops the daemons that .ci/slurm-up.sh started, by the PIDs it recorded. Leaves the packages
# installed. Safe to call when nothing runs.
set -uo pipefail

STATE="${HOPSTAT_SLURM_STATE:-/var/tmp/hopstat-slurm}"

stop() {
  local name="$1" pidfile="$STATE/run/$1.pid" pid
  [ -f "$pidfile" ] || return 0
  pid="$(cat "$pidfile")"
  # Only the program slurm-up.sh started: a stale PID may belong to another process by now.
  if [ "$(cat "/proc/$pid/comm" 2>/dev/null)" = "$name" ]; then
    kill -TERM "$pid"
    for _ in $(seq 1 50); do
      [ "$(cat "/proc/$pid/comm" 2>/dev/null)" = "$name" ] || break
      sleep 0.1
    done
    if [ "$(cat "/proc/$pid/comm" 2>/dev/null)" = "$name" ]; then
      echo "slurm-down: $name (pid $pid) ignored SIGTERM; sending SIGKILL" >&2
      kill -KILL "$pid" 2>/dev/null || true
    fi
  fi
  rm -f "$pidfile"
}

stop slurmd
stop slurmctld
stop munged
echo "slurm-down: stopped" >&2
