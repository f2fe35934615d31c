#!/usr/bin/env bash
# start-cluster.sh: install, configure and start a single-node Slurm cluster
# (munged + slurmctld + slurmd) on Debian 12 as root, without systemd.
# Daemon PIDs are written to $SLURM_BASE/<daemon>.bgpid; stop-cluster.sh kills only those.
set -euo pipefail

SLURM_BASE=${SLURM_BASE:-/tmp/slurm}          # state, spool, logs, pid files (wiped on start)
NODE=$(hostname -s)

t0=$(date +%s.%N)
step() { printf "[start-cluster] +%5.1fs %s\n" "$(awk -v a="$t0" -v b="$(date +%s.%N)" "BEGIN{print b-a}")" "$*"; }
case "$SLURM_BASE" in /tmp/?*) ;; *) echo "SLURM_BASE must be a folder under /tmp" >&2; exit 1;; esac
# alive FILE NAME: the PID in FILE is a live process called NAME
alive() { [ -s "$1" ] && [ "$(cat "/proc/$(cat "$1")/comm" 2>/dev/null)" = "$2" ]; }

# 0. refuse to run on top of a cluster we started earlier
for d in munged slurmctld slurmd; do
  if alive "$SLURM_BASE/$d.bgpid" "$d"; then
    echo "[start-cluster] $d already running (pid $(cat "$SLURM_BASE/$d.bgpid")); run stop-cluster.sh first" >&2
    exit 1
  fi
done

# 1. install. No service is started by the package scripts here (no systemd, and
#    /usr/sbin/policy-rc.d exits 101); we start the daemons ourselves below.
step "installing packages"
export DEBIAN_FRONTEND=noninteractive
if ! command -v slurmctld >/dev/null || ! command -v slurmd >/dev/null \
   || ! command -v munged >/dev/null || ! command -v sbatch >/dev/null; then
  # keep the package scripts from starting any service (this machine already has such a policy-rc.d)
  made_policy=
  if [ ! -e /usr/sbin/policy-rc.d ]; then
    printf '#!/bin/sh\nexit 101\n' > /usr/sbin/policy-rc.d; chmod +x /usr/sbin/policy-rc.d; made_policy=1
  fi
  apt-get update -qq
  apt-get install -y -qq --no-install-recommends slurmctld slurmd slurm-client munge >/dev/null
  [ -z "$made_policy" ] || rm -f /usr/sbin/policy-rc.d
fi

# 2. munge key (munge's postinst normally creates one already)
mkdir -p /etc/munge
if [ ! -s /etc/munge/munge.key ]; then
  dd if=/dev/urandom of=/etc/munge/munge.key bs=1024 count=1 status=none
fi
chown munge:munge /etc/munge /etc/munge/munge.key
chmod 0700 /etc/munge
chmod 0400 /etc/munge/munge.key
install -d -o munge -g munge -m 0755 /run/munge
install -d -o munge -g munge -m 0700 /var/log/munge
install -d -o munge -g munge -m 0711 /var/lib/munge

# 3. directories and slurm.conf (in the default place, so every client finds it without SLURM_CONF)
rm -rf "$SLURM_BASE"
mkdir -p "$SLURM_BASE/state" "$SLURM_BASE/spool/$NODE" "$SLURM_BASE/log"
# Node topology exactly as slurmd detects it; RealMemory at 90% so the node never drains for "Low RealMemory".
# e.g. "NodeName=vm CPUs=2 Boards=1 SocketsPerBoard=1 CoresPerSocket=2 ThreadsPerCore=1 RealMemory=24105"
DETECTED=$(slurmd -C)
HW=$(printf '%s\n' "$DETECTED" | sed -n '1{s/^NodeName=[^ ]* //;s/ *RealMemory=[0-9]*//;p}')
MEM=$(printf '%s\n' "$DETECTED" | sed -n '1s/.*RealMemory=\([0-9]*\).*/\1/p')
MEM=$(( ${MEM:-1000} * 9 / 10 ))
mkdir -p /etc/slurm
cat > /etc/slurm/slurm.conf <<CONF
ClusterName=ci
SlurmctldHost=${NODE}(127.0.0.1)
SlurmUser=root
SlurmdUser=root
AuthType=auth/munge
CredType=cred/munge
SlurmctldPort=6817
SlurmdPort=6818
StateSaveLocation=${SLURM_BASE}/state
SlurmdSpoolDir=${SLURM_BASE}/spool/%n
SlurmctldPidFile=${SLURM_BASE}/slurmctld.pid
SlurmdPidFile=${SLURM_BASE}/slurmd.pid
SlurmctldLogFile=${SLURM_BASE}/log/slurmctld.log
SlurmdLogFile=${SLURM_BASE}/log/slurmd.log
SlurmctldDebug=info
SlurmdDebug=info
MailProg=/bin/true
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
SelectType=select/cons_tres
SelectTypeParameters=CR_Core
SchedulerType=sched/backfill
SchedulerParameters=batch_sched_delay=0
SwitchType=switch/none
MpiDefault=none
AccountingStorageType=accounting_storage/none
JobAcctGatherType=jobacct_gather/none
JobCompType=jobcomp/none
ReturnToService=2
NodeName=${NODE} NodeAddr=127.0.0.1 ${HW} RealMemory=${MEM} State=UNKNOWN
PartitionName=debug Nodes=ALL Default=YES MaxTime=INFINITE State=UP
CONF

# 4. start the daemons in the background, in the foreground mode of each (-D / --foreground),
#    so that $! is the daemon itself; setpriv execs (no extra process) to drop to the munge user.
step "starting munged"
if munge -n </dev/null 2>/dev/null | unmunge >/dev/null 2>&1; then
  step "a munged is already answering on /run/munge; using it (not ours, will not be stopped)"
else
  nohup setpriv --reuid=munge --regid=munge --init-groups /usr/sbin/munged --foreground \
    </dev/null > "$SLURM_BASE/log/munged.out" 2>&1 &
  echo $! > "$SLURM_BASE/munged.bgpid"
  for _ in $(seq 1 100); do munge -n </dev/null 2>/dev/null | unmunge >/dev/null 2>&1 && break; sleep 0.1; done
  munge -n </dev/null | unmunge >/dev/null || { cat "$SLURM_BASE/log/munged.out"; exit 1; }
fi

step "starting slurmctld"
nohup /usr/sbin/slurmctld -D </dev/null > "$SLURM_BASE/log/slurmctld.out" 2>&1 &
echo $! > "$SLURM_BASE/slurmctld.bgpid"
for _ in $(seq 1 150); do scontrol ping 2>/dev/null | grep -q UP && break; sleep 0.2; done
scontrol ping | grep -q UP || { tail -n 40 "$SLURM_BASE/log/slurmctld.out"; exit 1; }

step "starting slurmd"
nohup /usr/sbin/slurmd -D -N "$NODE" </dev/null > "$SLURM_BASE/log/slurmd.out" 2>&1 &
echo $! > "$SLURM_BASE/slurmd.bgpid"
for _ in $(seq 1 150); do
  [ "$(sinfo -h -n "$NODE" -o %T 2>/dev/null)" = idle ] && break
  sleep 0.2
done
if [ "$(sinfo -h -n "$NODE" -o %T 2>/dev/null)" != idle ]; then
  echo "[start-cluster] node $NODE did not become idle" >&2
  sinfo -N -l >&2 || true
  tail -n 40 "$SLURM_BASE/log/slurmctld.out" "$SLURM_BASE/log/slurmd.out" >&2
  exit 1
fi
step "cluster up"
sinfo
