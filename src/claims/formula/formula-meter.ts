import { constantPoly, toBigInt, type PieceSet } from '../../engine/index.js';
import type { Measure } from '../claim-schema.js';
import { Meter, type Value } from '../measure.js';
import type { CompiledFormula, CompiledTerm } from './compile-formula.js';
import { evaluateTerms } from './evaluate-formula.js';

// A formula asks for the same small boundaries over and over (every η of every instance): keep each value.
const MAX_REMEMBERED = 1_000_000;

/** The theory name a formula side carries in results, counterexamples and reports. */
export const FORMULA_THEORY = 'formula';

/** Evaluates a formula's sides exactly, each boundary's value computed once per theory. */
export class FormulaMeter {
  private readonly meters = new Map<string, Meter>();
  private readonly memo = new Map<string, Map<string, Value>>();

  constructor(
    private readonly formula: CompiledFormula,
    measure: Measure,
    names: readonly string[],
    private readonly alphabet: readonly string[],
    /** Values are polynomials: an empty sum (the integer 0) is then the zero polynomial. */
    private readonly polynomial: boolean,
  ) {
    for (const [name, pieces] of formula.theories) {
      this.meters.set(name, new Meter(pieces as PieceSet, measure, names));
      this.memo.set(name, new Map());
    }
  }

  private valueOf(useCache: boolean) {
    return (theory: string, lengths: readonly number[], sides: readonly string[]): Value => {
      const meter = this.meters.get(theory)!;
      if (!useCache) return meter.value(lengths, sides, 'exact', undefined, false);
      const memo = this.memo.get(theory)!;
      const key = sides.join('|');
      let v = memo.get(key);
      if (v === undefined) {
        if (memo.size >= MAX_REMEMBERED) memo.clear();
        v = meter.value(lengths, sides, 'exact');
        memo.set(key, v);
      }
      return v;
    };
  }

  /** One side of the formula at the boundary b; `useCache` false recomputes every value from scratch. */
  side(terms: readonly CompiledTerm[], sides: readonly string[], variables: Readonly<Record<string, number>>, useCache = true): Value {
    // A confirmation recomputes every value by itself, without the open-side-5 shortcut.
    const side5Of = useCache ? (theory: string, lengths: readonly number[], s: readonly string[]) => this.meters.get(theory)!.side5Values(lengths, s) : undefined;
    const v = evaluateTerms(terms, sides, variables, this.valueOf(useCache), this.alphabet, side5Of);
    return this.polynomial && v.kind === 'int' ? { kind: 'poly', v: constantPoly(toBigInt(v.v)) } : v;
  }

  get left(): readonly CompiledTerm[] | undefined {
    return this.formula.left;
  }

  get right(): readonly CompiledTerm[] {
    return this.formula.right;
  }
}
