import { CodedError } from '../errors/index.js';
import { MAX_SHARDS } from './shard-partition.js';

/** What the Slurm scripts of one sharded sweep need; every path absolute. */
export interface SlurmScriptInput {
  readonly claimId: string;
  readonly fingerprint: string;
  readonly claimFile: string;
  readonly shards: number;
  readonly dir: string;
  readonly node: string;
  readonly cli: string;
  readonly partition?: string | undefined;
  /** Slurm's --time, e.g. 02:00:00 or 1-00:00:00. */
  readonly time?: string | undefined;
  readonly cpusPerTask: number;
  /** Extra `run` arguments passed to every shard (--max, --exact, --chunk-size). */
  readonly runArgs: readonly string[];
}

/** A file to write into the output folder. */
export interface ScriptFile {
  readonly name: string;
  readonly text: string;
  readonly executable: boolean;
}

/** Shell-quotes one word (single quotes, so nothing inside expands). */
export const sh = (s: string) => (/^[A-Za-z0-9_./:=@%+,-]+$/.test(s) ? s : `'${s.replace(/'/g, `'\\''`)}'`);

/** Seconds of a Slurm time limit `[D-]HH:MM:SS`; the error names `--time`. */
export function slurmSeconds(time: string): number {
  const m = /^(?:(\d+)-)?(\d{1,2}):(\d{2}):(\d{2})$/.exec(time);
  if (!m || Number(m[3]) > 59 || Number(m[4]) > 59) {
    throw new CodedError('invalid_argument', { what: '--time', expected: 'HH:MM:SS or D-HH:MM:SS as Slurm takes it', received: `'${time}'` }, { path: '--time' });
  }
  return Number(m[1] ?? 0) * 86400 + Number(m[2]) * 3600 + Number(m[3]) * 60 + Number(m[4]);
}

/**
 * The shard's own --time-limit: it stops handing out work a margin before Slurm's limit (10 %, at least
 * 30 s, at most half the limit) so running chunks end and the store is copied back before the kill.
 */
export function shardTimeLimit(seconds: number): number {
  const margin = Math.min(Math.max(30, Math.ceil(seconds / 10)), Math.floor(seconds / 2));
  return Math.max(1, seconds - margin);
}

/** Validates the scheduler options; errors name the flag. */
export function checkSlurmInput(i: SlurmScriptInput): void {
  if (!Number.isInteger(i.shards) || i.shards < 1 || i.shards > MAX_SHARDS) {
    throw new CodedError('invalid_argument', { what: '--shards', expected: `an integer from 1 to ${MAX_SHARDS}`, received: `${i.shards}` }, { path: '--shards', hint: "Slurm caps job arrays at the cluster's MaxArraySize (often 1001)" });
  }
  if (!Number.isInteger(i.cpusPerTask) || i.cpusPerTask < 1 || i.cpusPerTask > 1024) {
    throw new CodedError('invalid_argument', { what: '--cpus-per-task', expected: 'an integer from 1 to 1024', received: `${i.cpusPerTask}` }, { path: '--cpus-per-task' });
  }
  if (i.partition !== undefined && !/^[A-Za-z0-9_.,-]+$/.test(i.partition)) {
    throw new CodedError('invalid_argument', { what: '--partition', expected: 'a Slurm partition name (letters, digits, _ . , -)', received: `'${i.partition}'` }, { path: '--partition' });
  }
  if (i.time !== undefined) slurmSeconds(i.time);
  if (/[\s%]/.test(i.dir)) {
    throw new CodedError('invalid_argument', { what: '--out', expected: `a folder path without spaces or '%' (Slurm reads #SBATCH paths unquoted)`, received: `'${i.dir}'` }, { path: '--out' });
  }
}

const lines = (...xs: (string | false | undefined)[]) => `${xs.filter((x): x is string => typeof x === 'string').join('\n')}\n`;

/** Local-scratch helpers shared by both jobs: SQLite in WAL mode must not live on a network filesystem while written. */
function scratch(store: string): string {
  return lines(
    `STORE=${store}`,
    '# SQLite in WAL mode must not be written over a network filesystem: work on node-local scratch, copy back after.',
    'WORK="${TMPDIR:-/tmp}/puzzlesweep-${SLURM_JOB_ID:-$$}"',
    'mkdir -p "$WORK"',
    'LOCAL="$WORK/$(basename "$STORE")"',
    'if [ -f "$STORE" ]; then cp "$STORE" "$LOCAL"; [ ! -f "$STORE-wal" ] || cp "$STORE-wal" "$LOCAL-wal"; fi',
    'copy_back() {',
    '  [ -f "$LOCAL" ] || return 0',
    '  rm -f "$STORE-wal" "$STORE-shm"',
    '  cp "$LOCAL" "$STORE.part" && mv -f "$STORE.part" "$STORE"',
    '  [ ! -f "$LOCAL-wal" ] || cp "$LOCAL-wal" "$STORE-wal"',
    '}',
    'trap \'rm -rf "$WORK"\' EXIT',
    '# At the time limit or on scancel Slurm sends SIGTERM to every process of the job: puzzlesweep then stops',
    '# handing out work and keeps what is finished. This shell only waits for it, then copies the store back.',
    'run_bg() { "$@" & pid=$!; trap true TERM; wait "$pid"; rc=$?; while kill -0 "$pid" 2>/dev/null; do wait "$pid"; rc=$?; done; return "$rc"; }',
  );
}

function header(i: SlurmScriptInput, what: string): string {
  return lines(
    '#!/usr/bin/env bash',
    `# ${what} for claim ${i.claimId} (fingerprint ${i.fingerprint.slice(0, 12)}), written by 'puzzlesweep cluster-script'.`,
    `# Submit both jobs with: bash ${sh(`${i.dir}/submit.sh`)}`,
  );
}

const common = (i: SlurmScriptInput) =>
  lines(
    'set -uo pipefail',
    `DIR=${sh(i.dir)}`,
    `NODE="\${PUZZLESWEEP_NODE:-${i.node}}"`,
    `CLI="\${PUZZLESWEEP_CLI:-${i.cli}}"`,
    `CLAIM=${sh(i.claimFile)}`,
    `SHARDS=${i.shards}`,
  );

/** shard.sbatch, merge.sbatch, submit.sh and resubmit-failed.sh for one claim. */
export function slurmScripts(i: SlurmScriptInput): ScriptFile[] {
  checkSlurmInput(i);
  const name = `ps-${i.claimId}`.slice(0, 60);
  const sbatch = (extra: string[]) =>
    [...extra, i.partition && `#SBATCH --partition=${i.partition}`, i.time && `#SBATCH --time=${i.time}`].filter(Boolean) as string[];
  const timeLimit = i.time ? ['--time-limit', String(shardTimeLimit(slurmSeconds(i.time)))] : [];
  const runArgs = [...i.runArgs, ...timeLimit].map(sh).join(' ');
  const shard = lines(
    header(i, 'One task per shard of a job array').trimEnd(),
    ...sbatch([`#SBATCH --job-name=${name}`, `#SBATCH --array=0-${i.shards - 1}`, `#SBATCH --cpus-per-task=${i.cpusPerTask}`, `#SBATCH --output=${i.dir}/logs/shard-%a.job-%A.out`]),
    common(i).trimEnd(),
    'i=${SLURM_ARRAY_TASK_ID:?submit this script with sbatch: it is a job array}',
    '# The first submission runs the whole array, so Slurm\'s task count must be the shard count. A resubmission of',
    '# some shards (--array=2,5) has fewer tasks, so the count used is the one fixed in this file.',
    'if [ "${SLURM_ARRAY_TASK_MIN:-0}" = 0 ] && [ "${SLURM_ARRAY_TASK_MAX:-}" = "$((SHARDS - 1))" ] && [ "${SLURM_ARRAY_TASK_COUNT:-$SHARDS}" != "$SHARDS" ]; then',
    '  echo "expected $SHARDS array tasks, Slurm runs $SLURM_ARRAY_TASK_COUNT" >&2; exit 2',
    'fi',
    '# One worker thread per CPU Slurm gave this task.',
    'WORKERS="${SLURM_CPUS_PER_TASK:-1}"',
    'OK="$DIR/status/shard-$i.ok"',
    'rm -f "$OK"',
    scratch('"$DIR/stores/shard-$i-of-$SHARDS.sqlite"').trimEnd(),
    'echo "shard $i of $SHARDS on $(hostname) with $WORKERS workers, started $(date -u +%FT%TZ)"',
    `run_bg "$NODE" "$CLI" run "$CLAIM" --shard "$i/$SHARDS" --db "$LOCAL" --workers "$WORKERS" ${runArgs}`.trimEnd(),
    'rc=$?',
    'copy_back',
    'echo "shard $i ended with status $rc at $(date -u +%FT%TZ)"',
    '# 0: holds on all of the shard, 1: counterexamples found; both mean the shard is done. 4: unfinished (time',
    '# limit), 130: interrupted, 2/3: errors. Only a done shard succeeds, so the merge waits for a resubmission.',
    'if [ "$rc" -eq 0 ] || [ "$rc" -eq 1 ]; then touch "$OK"; exit 0; fi',
    'exit "$rc"',
  );
  const merge = lines(
    header(i, 'The merge job, run after every shard succeeded').trimEnd(),
    ...sbatch([`#SBATCH --job-name=${name}-merge`, '#SBATCH --cpus-per-task=1', `#SBATCH --output=${i.dir}/logs/merge.job-%j.out`]),
    common(i).trimEnd(),
    'shopt -s nullglob',
    'stores=("$DIR"/stores/shard-*-of-"$SHARDS".sqlite)',
    scratch('"$DIR/merged.sqlite"').trimEnd(),
    'run_bg "$NODE" "$CLI" merge "${stores[@]}" --into "$LOCAL"',
    'rc=$?',
    '# 0: complete; 4: merged, but shards are missing or unfinished (the report says which).',
    'if [ "$rc" -eq 0 ] || [ "$rc" -eq 4 ]; then',
    '  "$NODE" "$CLI" status "$CLAIM" --db "$LOCAL"',
    '  "$NODE" "$CLI" report "$CLAIM" --db "$LOCAL" --out "$DIR/report.html"',
    '  copy_back',
    'fi',
    'exit "$rc"',
  );
  const submitLine = 'array=$(sbatch --parsable "$DIR/shard.sbatch") && merge=$(sbatch --parsable --dependency=afterok:"${array%%;*}" "$DIR/merge.sbatch")';
  const submit = lines(
    '#!/usr/bin/env bash',
    `# Submits the ${i.shards}-task shard array of claim ${i.claimId} and a merge job that runs once every shard succeeded.`,
    'set -euo pipefail',
    `DIR=${sh(i.dir)}`,
    'mkdir -p "$DIR/logs" "$DIR/stores" "$DIR/status"',
    submitLine,
    'echo "${array%%;*} ${merge%%;*}" >> "$DIR/jobs.txt"',
    'echo "submitted shard array ${array%%;*} and merge job ${merge%%;*}; logs in $DIR/logs, merged store $DIR/merged.sqlite"',
  );
  const resubmit = lines(
    '#!/usr/bin/env bash',
    '# Resubmits only the shards that have not succeeded (no status/shard-<i>.ok), and a new merge job after them.',
    '# A shard resumes from its store, so finished chunks are not swept again.',
    'set -euo pipefail',
    `DIR=${sh(i.dir)}`,
    `SHARDS=${i.shards}`,
    `NAME=${sh(name)}`,
    'me=$(id -un)',
    '# squeue can time out while the controller is busy: ask again before giving up.',
    'q() { local k out; for k in 1 2 3 4 5; do out=$(squeue -h -u "$me" "$@") && { printf "%s" "$out"; return 0; }; sleep 2; done; return 1; }',
    'if [ -n "$(q -n "$NAME" -o %i)" ]; then echo "shards of $NAME are still queued or running; wait for them" >&2; exit 1; fi',
    'failed=()',
    'for ((i = 0; i < SHARDS; i++)); do [ -f "$DIR/status/shard-$i.ok" ] || failed+=("$i"); done',
    '# The merge job of an earlier submission waits forever on a dependency that can no longer be met: cancel it.',
    'for j in $(q -n "$NAME-merge" -o %i); do scancel "$j"; done',
    'if [ "${#failed[@]}" -eq 0 ]; then',
    '  merge=$(sbatch --parsable "$DIR/merge.sbatch"); echo "every shard succeeded; submitted merge job ${merge%%;*}"; exit 0',
    'fi',
    'list=$(IFS=,; echo "${failed[*]}")',
    'array=$(sbatch --parsable --array="$list" "$DIR/shard.sbatch")',
    'merge=$(sbatch --parsable --dependency=afterok:"${array%%;*}" "$DIR/merge.sbatch")',
    'echo "${array%%;*} ${merge%%;*}" >> "$DIR/jobs.txt"',
    'echo "resubmitted shards $list as array ${array%%;*}; merge job ${merge%%;*}"',
  );
  return [
    { name: 'shard.sbatch', text: shard, executable: true },
    { name: 'merge.sbatch', text: merge, executable: true },
    { name: 'submit.sh', text: submit, executable: true },
    { name: 'resubmit-failed.sh', text: resubmit, executable: true },
  ];
}

/** The one line that submits both jobs by hand (what submit.sh does, without its bookkeeping). */
export function submitOneLiner(dir: string): string {
  return `sbatch --dependency=afterok:$(sbatch --parsable ${sh(`${dir}/shard.sbatch`)} | cut -d';' -f1) ${sh(`${dir}/merge.sbatch`)}`;
}
