import { checkBoundary } from './boundary.js';
import type { PieceSet } from './piece-set.js';
import { makeRegion, type Region } from './region.js';

/** A side's labels in ascending boundary-label order: the identity class of its Grassmannian. */
export function sortedSide(side: string, pieces: PieceSet): string {
  const rank = (c: string) => pieces.boundaryLabels.indexOf(c);
  return [...side].sort((a, b) => rank(a) - rank(b)).join('');
}

/**
 * Glues the three cut-off corners back (sides s6, s2, s4) with their forced fillings and returns the
 * completed triangle with its clockwise boundary: NW = sort(σ6)+σ1+σ2, NE = sort(σ2)+σ3+σ4,
 * bottom = sort(σ4)+σ5+σ6. Each corner is the unique puzzle of c_{id,σ}^σ up to rotation.
 */
export function completeToTriangle(region: Region, sides: readonly string[], pieces: PieceSet): { region: Region; sides: string[] } {
  const [σ1, σ2, σ3, σ4, σ5, σ6] = checkBoundary(region, sides, pieces) as readonly string[];
  const n = region.size;
  return {
    region: makeRegion([n, 0, n, 0, n, 0]),
    sides: [sortedSide(σ6!, pieces) + σ1 + σ2, '', sortedSide(σ2!, pieces) + σ3 + σ4, '', sortedSide(σ4!, pieces) + σ5 + σ6, ''],
  };
}
