#!/usr/bin/env bash
# A throw-away single-node Slurm for the tests: munged with its own key, slurmctld and slurmd, all state, logs and
# sockets under DIR, nothing under /etc touched. Needs root (slurmd starts jobs as their owner) and the Debian
# packages slurm-wlm and munge.
#   local-slurm.sh start DIR CTLPORT DPORT   # prints the slurm.conf path when the node is idle; exit 3: cannot start
#   local-slurm.sh stop DIR                  # stops what start started (by the PID files in DIR only)
set -uo pipefail
cmd=${1:?start or stop}; dir=${2:?folder}
if [[ $cmd == stop ]]; then
  for d in slurmd slurmctld munged; do
    f="$dir/run/$d.pid"
    [[ -s $f ]] || continue
    pid=$(cat "$f")
    if kill -0 "$pid" 2>/dev/null; then
      kill -TERM "$pid"
      for _ in $(seq 1 40); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
      kill -0 "$pid" 2>/dev/null && kill -KILL "$pid"
    fi
    rm -f "$f"
  done
  exit 0
fi
ctl=${3:?slurmctld port}; dport=${4:?slurmd port}
for b in munged mungekey slurmctld slurmd sbatch; do
  command -v "$b" >/dev/null 2>&1 || { echo "local-slurm: $b is not installed (apt-get install slurm-wlm munge)"; exit 3; }
done
[[ $(id -u) == 0 ]] || { echo "local-slurm: needs root to start slurmd"; exit 3; }
host=$(hostname -s)
mkdir -p "$dir"/{munge,state,spool,run,log}
chmod 0755 "$dir" "$dir/munge"          # munged refuses a socket folder others can write to
mungekey --create --keyfile="$dir/munge/munge.key" --force >/dev/null 2>&1 || { echo "local-slurm: mungekey failed"; exit 3; }
chmod 0600 "$dir/munge/munge.key"
munged --force --key-file="$dir/munge/munge.key" --socket="$dir/munge/munge.socket.2" --pid-file="$dir/run/munged.pid" \
  --log-file="$dir/log/munged.log" --seed-file="$dir/munge/munged.seed" || { echo "local-slurm: munged did not start"; exit 3; }
# memory the node offers: most of the machine (jobs ask for --mem, which must fit)
mem=$(( $(awk '/MemTotal/ {print $2}' /proc/meminfo) / 1024 * 9 / 10 ))
cat > "$dir/slurm.conf" <<CONF
ClusterName=littoral-test
SlurmctldHost=$host(127.0.0.1)
SlurmUser=root
SlurmdUser=root
AuthType=auth/munge
CredType=cred/munge
AuthInfo=socket=$dir/munge/munge.socket.2
SlurmctldPort=$ctl
SlurmdPort=$dport
StateSaveLocation=$dir/state
SlurmdSpoolDir=$dir/spool
SlurmctldPidFile=$dir/run/slurmctld.pid
SlurmdPidFile=$dir/run/slurmd.pid
SlurmctldLogFile=$dir/log/slurmctld.log
SlurmdLogFile=$dir/log/slurmd.log
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
JobAcctGatherType=jobacct_gather/none
AccountingStorageType=accounting_storage/none
SchedulerType=sched/backfill
SchedulerParameters=sched_interval=1
SelectType=select/cons_tres
SelectTypeParameters=CR_Core
MpiDefault=none
ReturnToService=2
SlurmctldTimeout=30
SlurmdTimeout=30
MinJobAge=600
KillWait=2
NodeName=$host NodeAddr=127.0.0.1 CPUs=$(nproc) RealMemory=$mem State=UNKNOWN
PartitionName=debug Nodes=$host Default=YES MaxTime=INFINITE State=UP OverSubscribe=NO
CONF
export SLURM_CONF="$dir/slurm.conf"
slurmctld -f "$SLURM_CONF" || { echo "local-slurm: slurmctld did not start (see $dir/log)"; exit 3; }
slurmd -f "$SLURM_CONF" || { echo "local-slurm: slurmd did not start (see $dir/log)"; exit 3; }
for _ in $(seq 1 100); do
  if sinfo -h -o '%T' 2>/dev/null | grep -qx idle; then echo "$SLURM_CONF"; exit 0; fi
  sleep 0.2
done
echo "local-slurm: the node did not become idle in 20 s (see $dir/log)"; exit 3
