import type { CheckContext } from '../compile-context.js';

/** Fails unless the measure compares integers. */
export function needIntegerMeasure(type: string, ctx: CheckContext): void {
  if (!ctx.integer) {
    ctx.fail(
      { what: `Relation ${type}`, expected: `an integer measure ('puzzles', or 'value' of a theory with integer weights)`, received: `${ctx.polynomial ? 'a polynomial value' : 'a statistic distribution'}` },
      ctx.path,
      "compare with 'equal', or measure 'puzzles'",
    );
  }
}

/** Fails unless the measure is a polynomial in y. */
export function needPolynomialMeasure(type: string, ctx: CheckContext): void {
  const { measureType } = ctx;
  if (!ctx.polynomial) {
    ctx.fail({ what: `Relation ${type}`, expected: `a polynomial measure ('value' of a theory with y variables)`, received: `${measureType === 'value' ? 'an integer value' : `measure '${measureType}'`}` }, ctx.path, "use 'equal' for values without y variables");
  }
}
