#!/usr/bin/env bash
# stop-cluster.sh: stop the daemons that start-cluster.sh started, by their recorded PIDs only.
set -u
SLURM_BASE=${SLURM_BASE:-/tmp/slurm}
# gone: no such process, or only a zombie left (PID 1 reaps it shortly)
gone() { [ ! -e "/proc/$1" ] || [ "$(awk '{print $3}' "/proc/$1/stat" 2>/dev/null)" = Z ]; }
for d in slurmd slurmctld munged; do
  f="$SLURM_BASE/$d.bgpid"
  [ -s "$f" ] || continue
  pid=$(cat "$f")
  # signal the PID only if it is still the daemon we started (guards against PID reuse)
  if [ "$(cat "/proc/$pid/comm" 2>/dev/null)" = "$d" ] && ! gone "$pid"; then
    kill -TERM "$pid"
    for _ in $(seq 1 100); do gone "$pid" && break; sleep 0.1; done
    if ! gone "$pid"; then
      echo "[stop-cluster] $d ($pid) still alive after 10 s, sending KILL"; kill -KILL "$pid"
    fi
    echo "[stop-cluster] stopped $d ($pid)"
  fi
  rm -f "$f"
done
