#!/usr/bin/env bash
# Installs (if needed) and starts a single-node Slurm on loopback for hopstat's cluster tests
# (SlurmClusterIT). Run as root. Starts munged, slurmctld and slurmd by hand (no systemd; the
# image's policy-rc.d may forbid package scripts from starting daemons) and records their PIDs
# under $HOPSTAT_SLURM_STATE (default /var/tmp/hopstat-slurm) for .ci/slurm-down.sh.
# Idempotent: daemons already started by a previous call are reused.
# Exit 0 once `sinfo` shows the node idle and a trivial job ran; non-zero with the logs otherwise.
set -euo pipefail

STATE="${HOPSTAT_SLURM_STATE:-/var/tmp/hopstat-slurm}"
CONF_DIR=/etc/slurm
PARTITION=debug

log() { echo "slurm-up: $*" >&2; }

if [ "$(id -u)" -ne 0 ]; then
  log "must run as root (installs packages, starts daemons)"
  exit 1
fi

if ! command -v slurmctld >/dev/null || ! command -v slurmd >/dev/null || ! command -v sbatch >/dev/null || ! command -v munged >/dev/null; then
  log "installing slurmctld slurmd slurm-client munge"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq --no-install-recommends slurmctld slurmd slurm-client munge >/dev/null
fi

mkdir -p "$STATE"/{spool/ctld,spool/d,log,run}

# A daemon counts as running only if its recorded PID is alive and is that program (a PID file
# left from an earlier machine session may name a PID that now belongs to something else).
alive() {
  local pidfile="$STATE/run/$1.pid" pid
  [ -s "$pidfile" ] || return 1
  pid="$(cat "$pidfile")"
  [ "$(cat "/proc/$pid/comm" 2>/dev/null)" = "$1" ]
}

# --- munge -----------------------------------------------------------------------------------
if [ ! -s /etc/munge/munge.key ]; then
  log "creating /etc/munge/munge.key"
  mkdir -p /etc/munge
  dd if=/dev/urandom of=/etc/munge/munge.key bs=1 count=1024 status=none
fi
chown munge:munge /etc/munge/munge.key
chmod 0400 /etc/munge/munge.key
mkdir -p /run/munge /var/log/munge /var/lib/munge
chown munge:munge /run/munge /var/log/munge /var/lib/munge
chmod 0755 /run/munge
if ! alive munged; then
  # --force: a socket left by a killed munged would otherwise stop it from starting.
  runuser -u munge -- munged --force
  for _ in $(seq 1 50); do
    [ -s /run/munge/munged.pid ] && break
    sleep 0.1
  done
  cp /run/munge/munged.pid "$STATE/run/munged.pid"
fi
munge -n | unmunge >/dev/null || { log "munge does not work"; exit 1; }

# --- slurm.conf ----------------------------------------------------------------------------
HOST="$(hostname -s)"
# slurmd -C prints this node's hardware as a NodeName line: take CPUs and RealMemory from it.
HW="$(slurmd -C | head -1)"
CPUS="$(sed -n 's/.* CPUs=\([0-9]*\).*/\1/p' <<<"$HW")"
BOARDS="$(sed -n 's/.* Boards=\([0-9]*\).*/\1/p' <<<"$HW")"
SOCKETS="$(sed -n 's/.* SocketsPerBoard=\([0-9]*\).*/\1/p' <<<"$HW")"
CORES="$(sed -n 's/.* CoresPerSocket=\([0-9]*\).*/\1/p' <<<"$HW")"
THREADS="$(sed -n 's/.* ThreadsPerCore=\([0-9]*\).*/\1/p' <<<"$HW")"
MEM="$(sed -n 's/.* RealMemory=\([0-9]*\).*/\1/p' <<<"$HW")"
# Leave some memory to the OS so slurmd's own check never drains the node.
MEM=$(( MEM * 9 / 10 ))

mkdir -p "$CONF_DIR"
cat >"$CONF_DIR/slurm.conf" <<CONF
# Written by hopstat .ci/slurm-up.sh: single-node test cluster on loopback.
ClusterName=hopstat-ci
SlurmctldHost=${HOST}(127.0.0.1)
SlurmUser=root
SlurmdUser=root
AuthType=auth/munge
CryptoType=crypto/munge
MpiDefault=none
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
SelectType=select/cons_tres
SelectTypeParameters=CR_Core
ReturnToService=2
SchedulerType=sched/backfill
SchedulerParameters=batch_sched_delay=0,sched_min_interval=0
DependencyParameters=kill_invalid_depend
EnforcePartLimits=ALL
MinJobAge=3600
AccountingStorageType=accounting_storage/none
JobAcctGatherType=jobacct_gather/none
JobCompType=jobcomp/none
SlurmctldPort=6817
SlurmdPort=6818
StateSaveLocation=${STATE}/spool/ctld
SlurmdSpoolDir=${STATE}/spool/d
SlurmctldPidFile=${STATE}/run/slurmctld.pid
SlurmdPidFile=${STATE}/run/slurmd.pid
SlurmctldLogFile=${STATE}/log/slurmctld.log
SlurmdLogFile=${STATE}/log/slurmd.log
SlurmctldDebug=info
SlurmdDebug=info
NodeName=${HOST} NodeAddr=127.0.0.1 CPUs=${CPUS} Boards=${BOARDS} SocketsPerBoard=${SOCKETS} CoresPerSocket=${CORES} ThreadsPerCore=${THREADS} RealMemory=${MEM} State=UNKNOWN
PartitionName=${PARTITION} Nodes=${HOST} Default=YES MaxTime=INFINITE State=UP
CONF

# --- daemons --------------------------------------------------------------------------------
if ! alive slurmctld; then
  # -i: start even if state saved by an earlier instance cannot be read (job ids go on from it).
  slurmctld -i
fi
if ! alive slurmd; then
  slurmd
fi

for _ in $(seq 1 60); do
  if scontrol ping 2>/dev/null | grep -q UP && sinfo -h -N -o '%T' 2>/dev/null | grep -Eq '^(idle|mixed|allocated)'; then
    break
  fi
  sleep 0.5
done
if ! sinfo -h -N -o '%T' 2>/dev/null | grep -Eq '^(idle|mixed|allocated)'; then
  log "the node did not come up; sinfo says: $(sinfo -h -N -o '%N %T %E' 2>&1 || true)"
  tail -n 30 "$STATE/log/slurmctld.log" "$STATE/log/slurmd.log" >&2 || true
  exit 1
fi

# A trivial job proves the whole path (submission, scheduling, launch, completion).
OUT="$(srun -N1 -n1 -t 1 hostname 2>&1)" || { log "test job failed: $OUT"; tail -n 30 "$STATE/log/slurmd.log" >&2; exit 1; }
log "up: node ${HOST} (${CPUS} CPUs, ${MEM} MB) in partition ${PARTITION}; test job ran on ${OUT}"
