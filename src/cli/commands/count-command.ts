import type { CommandModule } from 'yargs';
import { getHeapStatistics } from 'node:v8';
import { generatingSemiring, type ProgressCallback } from '../../engine/index.js';
import { countJson, valueText } from '../../report/value-json.js';
import { countRegion, regionOfSides } from '../../claims/count-region.js';
import { slowCountNotice } from '../size-notice.js';
import { parseBoundary, triangleEchoJson, triangleEchoLines } from '../boundary-args.js';
import { classOptions, formOption } from '../class-options.js';
import type { ValueForm } from '../../report/root-form.js';
import { runCommand } from '../run-command.js';
import { CodedError } from '../../errors/index.js';
import { isLocalizationOnly, type LocalizationTheory } from '../../run/localization-theories.js';
import { loadTheory } from '../load-theory.js';
import { JSON_FORMAT_VERSION, valueJson } from '../../report/value-json.js';
import type { RegionValue } from '../../claims/count-region.js';

// Theories without a built-in puzzle rule: the structure constant of a triangle, computed by localization.
async function countByLocalization(theory: LocalizationTheory, args: CountArgs): Promise<void> {
  const { triangle } = parseBoundary(args);
  if (!triangle || triangle.strings.length !== 3 || args.sides !== undefined || args.completed || args.statistic !== undefined) {
    throw new CodedError('invalid_argument', { what: `--theory ${theory}`, expected: 'a structure constant --triangle λ,μ,ν (or --partitions)', received: 'another boundary or option' }, {
      path: '--theory',
      hint:
        theory === 'equivariant-k-theory'
          ? 'no built-in puzzle rule, so only triangles are computed, by localization; other regions: --theory conjectures/pieces/equivariant-k-theory-rhombi.json (verified to n = 6; README, "Theories")'
          : 'no puzzle rule for this theory agrees with localization yet, so only triangles are computed, by localization (README, "Theories")',
    });
  }
  const [lambda, mu, nu] = triangle.strings as [string, string, string];
  const n = lambda.length;
  const { localizationLetter, localizationValue } = await import('../../run/localization-values.js');
  const value: RegionValue = { type: 'fraction', value: localizationValue(theory, lambda, mu, nu), size: n, letter: localizationLetter(theory), variableNames: [] };
  if (args.json) {
    process.stdout.write(`${JSON.stringify({ formatVersion: JSON_FORMAT_VERSION, theory, ...triangleEchoJson(triangle), source: 'localization', puzzles: null, value: valueJson(value) })}\n`);
    return;
  }
  const lines = [`theory:  ${theory} (by localization: no puzzle rule is built in)`, ...triangleEchoLines(triangle), `value:   ${valueText(value)}`];
  process.stdout.write(`${lines.join('\n')}\n`);
}

// A progress line on stderr for counts that run longer than a second, refreshed at most twice a second.
function progressLine(): ProgressCallback {
  const start = Date.now();
  let shown = 0;
  return ({ done, total, profiles }) => {
    const now = Date.now();
    if (now - start < 1000 || now - shown < 500) return;
    shown = now;
    process.stderr.write(`\r\x1b[Kcounting: step ${done}/${total}, ${profiles} live profiles, ${((now - start) / 1000).toFixed(0)} s`);
  };
}

interface CountArgs {
  theory: string;
  triangle?: string;
  partitions?: string;
  grassmannian?: string;
  sides?: string;
  form: ValueForm;
  completed: boolean;
  statistic?: string;
  json: boolean;
}

export const countCommand: CommandModule<object, CountArgs> = {
  command: 'count',
  describe: 'Print the value of one boundary (the sum over its puzzles of the product of piece weights)',
  builder: (y) =>
    formOption(classOptions(y, 'λ,μ,ν'))
      .option('theory', { type: 'string', demandOption: true, describe: "cohomology | equivariant | k-theory | dual-k-theory | ssm-nonequivariant | ssm | path to a piece-set JSON; triangles only, by localization: equivariant-k-theory | ssm-chern" })
      .option('sides', { type: 'string', describe: "six clockwise side strings s1,…,s6; an empty side is '' or '-'" })
      .option('completed', { type: 'boolean', default: false, describe: 'count the completed triangle instead of the region itself' })
      .option('statistic', { type: 'string', describe: 'also count puzzles by their number of pieces of this kind (e.g. k-piece, equivariant)' })
      .option('json', { type: 'boolean', default: false, describe: 'print one JSON object' }) as never,
  handler: (args) =>
    runCommand(args.json, async () => {
      if (isLocalizationOnly(args.theory)) {
        await countByLocalization(args.theory, args);
        return;
      }
      const pieces = await loadTheory(args.theory);
      const { sides, triangle } = parseBoundary(args);
      // Half the heap: the engine stops with a coded error naming the limit instead of exhausting V8.
      const memoryLimitBytes = Math.floor(getHeapStatistics().heap_size_limit / 2);
      const result = countRegion(pieces, sides, {
        completed: args.completed,
        memoryLimitBytes,
        onProgress: slowCountNotice(regionOfSides(sides), `counting in ${pieces.name}`, process.stderr.isTTY ? progressLine() : undefined),
        ...(args.statistic !== undefined ? { statistic: args.statistic } : {}),
      });
      if (process.stderr.isTTY) process.stderr.write('\r\x1b[K');
      if (args.json) {
        process.stdout.write(`${JSON.stringify(countJson(result, args.form, triangle ? triangleEchoJson(triangle) : {}))}\n`);
        return;
      }
      const counted = result.completion ?? result;
      const lines = [
        `theory:  ${result.theory}`,
        `region:  ${result.region.lengths.join(',')} (completed triangle N = ${result.region.size})`,
        // A triangle is echoed as typed (ν left to right), never as the clockwise bottom string.
        ...(triangle ? triangleEchoLines(triangle) : [`sides:   ${result.sides.map((s) => s || '-').join(' | ')}`]),
        ...(result.completion ? [`counted: completed triangle, sides ${counted.sides.map((s) => s || '-').join(' | ')}`] : []),
        `puzzles: ${result.puzzles}`,
        `value:   ${valueText(result.value, args.form)}`,
        ...(result.distribution ? [`puzzles by number of ${result.distribution.kind} pieces: ${generatingSemiring.toText(result.distribution.counts)}`] : []),
      ];
      process.stdout.write(`${lines.join('\n')}\n`);
    }),
};
