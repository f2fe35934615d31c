import { checkBoundary, reverseString } from './boundary.js';
import type { UnitTriangle } from './lattice.js';
import type { Piece, PieceSet } from './piece-set.js';
import type { Region } from './region.js';
import { compilePlan, expandStep, labelChar, type TransferPlan } from './transfer-plan.js';
import { formulaRing, positionIndices } from './weigher.js';
import { fractionSemiring } from './semirings/fraction-semiring.js';
import { evaluateFormula, formulaUses } from './weight-formula.js';

export interface PlacedPiece {
  readonly triangle: UnitTriangle;
  readonly piece: Piece;
  /** The piece's weight at this position as text: `1`, `-1`, `q`, `y5 - y2`. */
  readonly weight: string;
}

/** One filling of a region: its pieces in sweep order (rows top-down, left to right). */
export interface Puzzle {
  readonly region: Region;
  readonly sides: readonly string[];
  readonly pieces: readonly PlacedPiece[];
}

export function weightText(piece: Piece, triangle: UnitTriangle): string {
  const w = piece.weight;
  if (w.type === 'integer') return String(w.value);
  if (w.type === 'variable') return w.name;
  const { i, j } = positionIndices(triangle);
  if (w.type === 'formula') {
    // The formula's exact value on this triangle, e.g. `(y3 - y1) / (y3 - y1 + 1)` or `1 - t1*t3^-1`.
    const ring = fractionSemiring(j, formulaUses(w.formula).letters.has('t') ? 't' : 'y');
    return ring.toText(evaluateFormula(w.formula, formulaRing(ring), { i, j }));
  }
  return `y${j} - y${i}`;
}

// Profiles reachable from the start at each step, then pruned to those that still reach the target,
// so the depth-first walk below never enters a dead end.
function liveProfiles(plan: TransferPlan, target: string): Set<string>[] {
  const reach: Set<string>[] = [new Set([plan.initial])];
  plan.steps.forEach((step, s) => {
    const next = new Set<string>();
    for (const key of reach[s]!) expandStep(plan, step, key, (nk) => next.add(nk));
    reach.push(next);
  });
  const live: Set<string>[] = new Array(reach.length);
  live[reach.length - 1] = new Set(reach[reach.length - 1]!.has(target) ? [target] : []);
  for (let s = plan.steps.length - 1; s >= 0; s--) {
    const keep = new Set<string>();
    for (const key of reach[s]!) {
      let alive = false;
      expandStep(plan, plan.steps[s]!, key, (nk) => {
        if (live[s + 1]!.has(nk)) alive = true;
      });
      if (alive) keep.add(key);
    }
    live[s] = keep;
  }
  return live;
}

/** Every puzzle with this boundary, lazily, in a fixed order; never explores a dead end. */
export function* enumeratePuzzles(region: Region, sides: readonly string[], pieces: PieceSet): Generator<Puzzle> {
  const boundary = checkBoundary(region, sides, pieces);
  const plan = compilePlan(region, boundary, pieces);
  const target = [...reverseString(sides[4]!)].map((c) => labelChar(pieces.labels.indexOf(c))).join('');
  const live = liveProfiles(plan, target);
  if (!live[0]!.has(plan.initial)) return;
  const chosen: PlacedPiece[] = [];
  function* walk(s: number, key: string): Generator<Puzzle> {
    if (s === plan.steps.length) {
      yield { region, sides: [...sides], pieces: [...chosen] };
      return;
    }
    const step = plan.steps[s]!;
    const moves: [string, number][] = [];
    expandStep(plan, step, key, (nk, piece) => {
      if (live[s + 1]!.has(nk)) moves.push([nk, piece]);
    });
    for (const [nk, piece] of moves) {
      if (piece >= 0 && (step.type === 'up' || step.type === 'down')) {
        const p = pieces.pieces[piece]!;
        chosen.push({ triangle: step.triangle, piece: p, weight: weightText(p, step.triangle) });
        yield* walk(s + 1, nk);
        chosen.pop();
      } else {
        yield* walk(s + 1, nk);
      }
    }
  }
  yield* walk(0, plan.initial);
}
