import type { TheoryInput } from '../claims/index.js';
import { Meter, type Value } from '../claims/measure.js';
import type { PieceSet } from '../engine/index.js';

/** Every boundary's value computed once per theory and shared by all the candidates that ask for it. */
export class ValueTable {
  private readonly meters = new Map<string, Meter>();
  private readonly values = new Map<string, Map<string, Value>>();
  /** Number of values computed (not looked up). */
  computed = 0;
  readonly names: readonly string[];

  constructor(theories: ReadonlyMap<string, PieceSet>) {
    this.names = [...new Set([...theories.values()].flatMap((p) => p.pieces.flatMap((q) => (q.weight.type === 'variable' ? [q.weight.name] : []))))].sort();
    for (const [name, pieces] of theories) {
      this.meters.set(name, new Meter(pieces, { type: 'value' }, this.names));
      this.values.set(name, new Map());
    }
  }

  /** The exact value of a boundary in a theory (by name). */
  value(theory: string, lengths: readonly number[], sides: readonly string[]): Value {
    const table = this.values.get(theory)!;
    const key = sides.join('|');
    let v = table.get(key);
    if (v === undefined) {
      v = this.meters.get(theory)!.value(lengths, sides, 'exact');
      table.set(key, v);
      this.computed++;
    }
    return v;
  }

  /** Values held, over all theories. */
  get size(): number {
    let n = 0;
    for (const t of this.values.values()) n += t.size;
    return n;
  }
}

/** A theory's display name as the claims layer names it. */
export function theoryName(t: TheoryInput, pieces: PieceSet): string {
  return typeof t === 'string' ? t : pieces.name;
}
