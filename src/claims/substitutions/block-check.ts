import { evalAffine, valuesText } from '../affine.js';
import type { ExpressionInput } from '../affine.js';
import type { CheckContext } from '../compile-context.js';

/** Checks 1 ≤ from ≤ to ≤ N at every point of the variable box. */
export function checkBlock(from: ExpressionInput, to: ExpressionInput, ctx: CheckContext, n: (v: Record<string, number>) => number): void {
  const f = ctx.expr(from, `${ctx.path}.from`);
  const t = ctx.expr(to, `${ctx.path}.to`);
  const bad = ctx.pointWhere((v) => 1 <= evalAffine(f, v) && evalAffine(f, v) <= evalAffine(t, v) && evalAffine(t, v) <= n(v));
  if (bad) {
    ctx.fail(
      { what: 'Substitution block', expected: '1 ≤ from ≤ to ≤ N', received: `from = ${evalAffine(f, bad)}, to = ${evalAffine(t, bad)}, N = ${n(bad)} at ${valuesText(bad)}` },
      ctx.path,
      'indices are those of y_1..y_N, N = s6+s1+s2 of the completed triangle',
    );
  }
}
