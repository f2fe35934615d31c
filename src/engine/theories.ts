
import { buildPieceSet, type PieceSet, type PieceSpec } from './piece-set.js';
import { CodedError } from '../errors/index.js';
import { ssmCrossingPieces } from './ssm-pieces.js';

export const BUILTIN_THEORIES = ['cohomology', 'equivariant', 'k-theory', 'dual-k-theory', 'ssm-nonequivariant', 'ssm'] as const;
export type BuiltinTheory = (typeof BUILTIN_THEORIES)[number];

/** Internal label of the horizontal edge inside the equivariant rhombus. */
export const RHOMBUS_LABEL = 'eq';

const COHOMOLOGY: PieceSpec[] = [
  { name: '0-triangle', edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up', 'down'] },
  { name: '1-triangle', edges: { horizontal: '1', rising: '1', falling: '1' }, orientations: ['up', 'down'] },
  { name: '10-triangle', edges: { horizontal: '1', rising: '0', falling: '10' }, orientations: ['up', 'down'], rotations: true },
];

// The equivariant rhombus is the up triangle Up(x, y+1) on top of Down(x, y); it is stated as two
// unit triangles joined by a label of their own. Its weight sits on the lower half; the statistic
// "equivariant" counts rhombi because only the lower half has that kind.
const EQUIVARIANT_RHOMBUS: PieceSpec[] = [
  { name: 'equivariant-upper', kind: 'equivariant-upper', edges: { horizontal: RHOMBUS_LABEL, rising: '0', falling: '1' }, orientations: ['up'] },
  { name: 'equivariant', edges: { horizontal: RHOMBUS_LABEL, rising: '0', falling: '1' }, orientations: ['down'], weight: { type: 'position' } },
];

const K_UP: PieceSpec = { name: 'k-piece', edges: { horizontal: '10', rising: '10', falling: '10' }, orientations: ['up'], weight: { type: 'integer', value: -1 } };
const K_DOWN: PieceSpec = { name: 'k-piece', edges: { horizontal: '10', rising: '10', falling: '10' }, orientations: ['down'], weight: { type: 'integer', value: -1 } };

const SPECS: Record<BuiltinTheory, PieceSpec[]> = {
  cohomology: COHOMOLOGY,
  equivariant: [...COHOMOLOGY, ...EQUIVARIANT_RHOMBUS],
  'k-theory': [...COHOMOLOGY, K_UP],
  'dual-k-theory': [...COHOMOLOGY, K_DOWN],
  // Segre–Schwartz–MacPherson classes of Schubert cells at y = 0: both K-triangles, each weighing −1
  // (Knutson–Zinn-Justin 2021); checked against localization at y = 0 on every triple with n ≤ 6.
  'ssm-nonequivariant': [...COHOMOLOGY, K_UP, K_DOWN],
  // Equivariant SSM classes: the y = 0 pieces plus crossing rhombi weighing ±(y_j − y_i)/(1 + y_j − y_i)
  // (ssm-pieces.ts); checked against localization on every triple with n ≤ 6.
  ssm: [...COHOMOLOGY, K_UP, K_DOWN, ...ssmCrossingPieces(RHOMBUS_LABEL)],
};

const cache = new Map<BuiltinTheory, PieceSet>();

export function isBuiltinTheory(name: string): name is BuiltinTheory {
  return (BUILTIN_THEORIES as readonly string[]).includes(name);
}

/** The piece set of a built-in theory; throws `unknown_theory` listing the valid names. */
export function theoryPieceSet(name: string): PieceSet {
  if (!isBuiltinTheory(name)) {
    throw new CodedError('unknown_theory', { received: name, choices: BUILTIN_THEORIES }, { path: 'theory', hint: 'or give the path of a custom piece-set JSON file' });
  }
  let set = cache.get(name);
  if (!set) {
    set = buildPieceSet({ name, boundaryLabels: ['0', '1'], pieces: SPECS[name] });
    cache.set(name, set);
  }
  return set;
}
