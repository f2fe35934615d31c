import type { CommandModule } from 'yargs';
import { resolveTheory } from '../../claims/resolve-theory.js';
import { expandProduct } from '../../products/expand-product.js';
import { partitionOf, productJson } from '../../products/table-formats.js';
import type { ValueForm } from '../../report/root-form.js';
import { valueText } from '../../report/value-json.js';
import { parseClassArgs, triangleEchoLines } from '../boundary-args.js';
import { classOptions, formOption } from '../class-options.js';
import { runCommand } from '../run-command.js';
import { isLocalizationOnly, localizationProduct } from '../../run/localization-values.js';

interface ExpandArgs {
  theory: string;
  triangle?: string;
  partitions?: string;
  grassmannian?: string;
  form: ValueForm;
  json: boolean;
}

export const expandCommand: CommandModule<object, ExpandArgs> = {
  command: 'expand',
  describe: 'Expand a whole product σ_λ·σ_μ: every ν with a nonzero structure constant, from one sweep',
  builder: (y) =>
    formOption(classOptions(y, 'λ,μ'))
      .option('theory', { type: 'string', demandOption: true, describe: 'cohomology | equivariant | k-theory | dual-k-theory | ssm-nonequivariant | ssm | path to a piece-set JSON; by localization: equivariant-k-theory | ssm-chern' })
      .option('json', { type: 'boolean', default: false, describe: 'print one JSON object' }) as never,
  handler: (args) =>
    runCommand(args.json, () => {
      const echo = parseClassArgs(args, 2);
      const [lambda, mu] = echo.strings as [string, string];
      // Theories without a built-in puzzle rule are expanded by localization.
      const product = isLocalizationOnly(args.theory) ? localizationProduct(args.theory, lambda, mu) : expandProduct(resolveTheory(args.theory), lambda, mu);
      if (args.json) {
        process.stdout.write(`${JSON.stringify(productJson(product, args.form, echo.grassmannian))}\n`);
        return;
      }
      const n = product.products.length;
      const rows = product.products.map((t) => [t.nu, echo.grassmannian ? partitionOf(t.nu) : '', valueText(t.value, args.form)] as const);
      const w0 = Math.max(1, ...rows.map((r) => r[0].length));
      const w1 = Math.max(9, ...rows.map((r) => r[1].length));
      const polynomial = product.products.some((t) => t.value.type === 'polynomial');
      const lines = [
        `theory:  ${product.theory}`,
        ...triangleEchoLines(echo, ['λ', 'μ']),
        `σ_λ·σ_μ has ${n} term${n === 1 ? '' : 's'}${polynomial && args.form !== 'expanded' ? ' (z_m = y_{m+1} - y_m)' : ''}:`,
        ...(n ? [`  ${'ν'.padEnd(w0)}  ${(echo.grassmannian ? 'partition' : '').padEnd(w1)}  value`] : []),
        ...rows.map((r) => `  ${r[0].padEnd(w0)}  ${r[1].padEnd(w1)}  ${r[2]}`),
      ];
      process.stdout.write(`${lines.join('\n')}\n`);
    }),
};
