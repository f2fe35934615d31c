import type { CommandModule } from 'yargs';

/** A command as the top-level help lists it, and how to load its full module when it is the one invoked. */
export interface CommandEntry {
  readonly name: string;
  /** The yargs command string (name and positionals). */
  readonly command: string;
  readonly describe: string;
  readonly load: () => Promise<CommandModule<object, never>>;
}

// Only the invoked command's module is imported, so `--help` and light commands never load zod, SQLite, the
// worker pool or the report renderers. A unit test checks these strings against each module's own.
const entry = (command: string, describe: string, load: () => Promise<unknown>): CommandEntry => ({
  name: command.split(' ')[0]!,
  command,
  describe,
  load: load as () => Promise<CommandModule<object, never>>,
});

/** Every command in the order of the top-level help. */
export const COMMANDS: readonly CommandEntry[] = [
  entry('count', 'Print the value of one boundary (the sum over its puzzles of the product of piece weights)', async () => (await import('./commands/count-command.js')).countCommand),
  entry('expand', 'Expand a whole product σ_λ·σ_μ: every ν with a nonzero structure constant, from one sweep', async () => (await import('./commands/expand-command.js')).expandCommand),
  entry('table', 'Every nonzero structure constant c_{λμ}^ν of Gr(k,n) in a theory, as CSV, JSON or a LaTeX table', async () => (await import('./commands/table-command.js')).tableCommand),
  entry('show', 'Draw every puzzle of one boundary as text, or into an SVG picture or a LaTeX/TikZ document', async () => (await import('./commands/show-command.js')).showCommand),
  entry('run <claims..>', 'Sweep claim files over every boundary of their families, storing results as they finish', async () => (await import('./commands/run-claims-command.js')).runClaimsCommand),
  entry('status [claim]', 'Verified classes, counterexample counts and the last run, per stored claim', async () => (await import('./commands/status-command.js')).statusCommand),
  entry('counterexamples <claim>', 'List the stored counterexamples of a claim in sweep order', async () => (await import('./commands/counterexamples-command.js')).counterexamplesCommand),
  entry('replay <claim>', 'Recompute one instance of a claim exactly: both boundaries, both values and their puzzles', async () => (await import('./commands/replay-command.js')).replayCommand),
  entry('schema', 'Print (or write with --out) the JSON Schema of claim files, for editor completion and validation', async () => (await import('./commands/schema-command.js')).schemaCommand),
  entry('demo', 'Sweep the shipped conjectures into results/puzzlesweep.sqlite (under a minute; run again to resume) and say where the results are', async () => (await import('./commands/demo-command.js')).demoCommand),
  entry('crosscheck', 'Compare the engine with independent computations (LR rule, localization, Grothendieck polynomials, Möbius inversion); equivariant-k-theory and ssm-chern need --pieces', async () => (await import('./commands/crosscheck-command.js')).crosscheckCommand),
  entry('report <claim>', 'Write one self-contained HTML page of a claim: classes swept, counterexamples drawn with all their puzzles', async () => (await import('./commands/report-command.js')).reportCommand),
  entry('discover <family>', 'Search a family for the symmetries that hold (smallest classes first) and write each survivor as a claim file', async () => (await import('./commands/discover-command.js')).discoverCommand),
  entry('merge <stores..>', 'Merge store files (e.g. the shards of a cluster sweep) into one; refuses conflicting results and reports missing shards', async () => (await import('./commands/merge-command.js')).mergeCommand),
  entry('cluster-script <claim>', 'Write Slurm scripts that sweep a claim as a job array of shards, then merge their stores', async () => (await import('./commands/cluster-script-command.js')).clusterScriptCommand),
];

/** The command name an argument list invokes (its first word that is not an option), if any. */
export function invokedCommand(argv: readonly string[]): string | undefined {
  return argv.find((a) => !a.startsWith('-'));
}
