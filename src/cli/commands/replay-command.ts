import { existsSync } from 'node:fs';
import type { CommandModule } from 'yargs';
import { compileClaimProgram, createEvaluator, planClaim, type ClaimPlanExt } from '../../claims/index.js';
import { checkClassKey } from '../../run/family-size.js';
import type { Instance, Measured } from '../../claims/claim-api.js';
import { enumeratePuzzles, makeRegion, type PieceSet } from '../../engine/index.js';
import { CodedError, toCodedError } from '../../errors/index.js';
import { drawPuzzleText } from '../../report/text-drawing.js';
import { loadSweepClaim } from '../../run/load-sweep-claim.js';
import { parseRunOptions } from '../../run/run-options.js';
import { DEFAULT_STORE_PATH } from '../../store/index.js';
import { parseBoundaryArgs } from '../boundary-args.js';
import { runCommand } from '../run-command.js';
import { openExistingStore, storedClaims } from '../stored-claims.js';
import { summaryJson } from '../sweep-summary-text.js';
import { VALUE_FORMS, type ValueForm } from '../../report/root-form.js';
import { valueInForm } from '../value-in-form.js';
import { JSON_FORMAT_VERSION } from '../../report/value-json.js';

interface ReplayArgs {
  claim: string;
  instance?: string;
  sides?: string;
  max?: string[];
  db: string;
  limit: number;
  json: boolean;
  form: ValueForm;
}

/** The canonical JSON of the claim: from its file, or from the store when given an id or fingerprint. */
function claimJson(ref: string, db: string): { id: string; json: string } {
  if (existsSync(ref)) {
    const c = loadSweepClaim(ref);
    return { id: c.id, json: c.canonicalJson };
  }
  const store = openExistingStore(db);
  try {
    const c = storedClaims(store, ref).claims[0]!;
    return { id: c.claimId, json: c.canonicalJson };
  } finally {
    store.close();
  }
}

function findInstance(plan: ClaimPlanExt, args: ReplayArgs): Instance {
  if ((args.instance === undefined) === (args.sides === undefined)) {
    throw new CodedError('invalid_argument', { what: 'Instance', expected: 'exactly one of --instance or --sides', received: `${args.instance === undefined ? 'neither' : 'both'}` }, {
      path: '--instance / --sides',
      hint: "copy the replay command a run prints, e.g. --instance 'n=3:17'",
    });
  }
  if (args.instance !== undefined) {
    const at = args.instance.lastIndexOf(':');
    const index = args.instance.slice(at + 1);
    if (at < 0 || !/^\d+$/.test(index)) {
      throw new CodedError('invalid_argument', { what: '--instance', expected: `<class key>:<index> such as 'n=3:17'`, received: `'${args.instance}'` }, { path: '--instance' });
    }
    return plan.instanceAt(plan.classForKey(args.instance.slice(0, at)), BigInt(index));
  }
  const sides = parseBoundaryArgs({ sides: args.sides });
  const lengths = sides.map((s) => [...s].length);
  const max = parseRunOptions({ max: args.max ?? [] }).max;
  for (const cls of plan.classes(max)) {
    if (cls.lengths.some((l, i) => l !== lengths[i])) continue;
    const index = plan.indexOf(cls, sides);
    if (index !== undefined) return plan.instanceAt(cls, index);
  }
  throw new CodedError('invalid_argument', { what: '--sides', expected: `a boundary of the claim's family`, received: `side lengths ${lengths.join(',')}` }, {
    path: '--sides',
    hint: 'check the content conditions of the family, or raise a bound with --max var=value',
  });
}

function measuredText(label: string, m: Measured, pieces: PieceSet, limit: number, form: ValueForm, formula = false): string[] {
  const lines = [`${label}: ${m.theory}, side lengths ${m.lengths.join(',')}`, `  sides: ${m.sides.map((s) => s || '-').join(' | ')}`, `  value: ${valueInForm(m.text, m.sides, pieces, form)}`];
  // A formula side is a sum of products of other boundaries' values: b's own puzzles are not its puzzles.
  if (formula) return [...lines, '  (the claim\'s formula evaluated at b: a sum of products of values of other boundaries, so no puzzles are drawn)'];
  let shown = 0;
  let more = false;
  try {
    for (const puzzle of enumeratePuzzles(makeRegion(m.lengths), m.sides, pieces)) {
      if (shown === limit) {
        lines.push(`  … more puzzles not drawn (raise --limit)`);
        more = true;
        break;
      }
      shown++;
      lines.push(`  puzzle ${shown}`, ...drawPuzzleText(puzzle).split('\n').map((l) => `    ${l}`));
    }
  } catch (e) {
    throw toCodedError(e);
  }
  if (shown === 0 && !more) lines.push('  no puzzles');
  return lines;
}

export const replayCommand: CommandModule<object, ReplayArgs> = {
  command: 'replay <claim>',
  describe: 'Recompute one instance of a claim exactly: both boundaries, both values and their puzzles',
  builder: (y) =>
    y
      .positional('claim', { type: 'string', describe: 'claim file, or a stored claim id or fingerprint' })
      .option('instance', { type: 'string', describe: "<class key>:<index>, e.g. 'n=3:17' (as a run prints it)" })
      .option('sides', { type: 'string', describe: "or the six clockwise side strings s1,…,s6 (empty side '-')" })
      .option('max', { type: 'string', array: true, describe: 'with --sides: raised bounds to search, e.g. --max n=6' })
      .option('db', { type: 'string', default: DEFAULT_STORE_PATH, describe: 'store to read the claim from when given an id' })
      .option('limit', { type: 'number', default: 10, describe: 'draw at most this many puzzles per boundary' })
      .option('json', { type: 'boolean', default: false, describe: 'print one JSON object (no drawings)' })
      .option('form', { choices: VALUE_FORMS, default: 'expanded' as const, describe: 'polynomial values: expanded in y (as stored), in z_m = y_{m+1} - y_m when positive there (roots), or factored' }) as never,
  handler: (args) =>
    runCommand(args.json, () => {
      const { id, json } = claimJson(args.claim, args.db);
      const claim = compileClaimProgram(JSON.parse(json) as unknown);
      // An absurd class key (e.g. n=100000) is refused before its region is built.
      if (args.instance?.includes(':')) checkClassKey(claim, args.instance.slice(0, args.instance.lastIndexOf(':')));
      const plan = planClaim(claim);
      const instance = findInstance(plan, args);
      const r = createEvaluator(claim, { exact: true }).confirm(instance);
      if (args.json) {
        process.stdout.write(`${summaryJson({ formatVersion: JSON_FORMAT_VERSION, claimId: id, instance: `${instance.classKey}:${instance.index}`, ...r })}\n`);
        return r.status === 'fails' ? 1 : 0;
      }
      const lines = [
        `claim ${id}, instance ${instance.classKey}:${instance.index}: ${r.status}${r.status === 'fails' ? ' (counterexample)' : ''} [exact]`,
        ...(r.permutation ? [`permutation: [${r.permutation.join(',')}]`] : []),
        ...measuredText(claim.formula?.left ? 'left (formula)' : 'left', r.left, plan.compiled.left, args.limit, args.form, claim.formula?.left !== undefined),
        ...measuredText(claim.formula ? 'right (formula)' : 'right', r.right, plan.compiled.right, args.limit, args.form, claim.formula !== undefined),
        // The right value above is T(b)'s own; the relation compares the left value with σ applied to it.
        ...(r.substituted ? [`σ(right value), σ = ${r.substitution}: ${r.substituted.text}`] : []),
      ];
      process.stdout.write(`${lines.join('\n')}\n`);
      return r.status === 'fails' ? 1 : 0;
    }),
};
