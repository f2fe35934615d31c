import { isBuiltinTheory, theoryPieceSet, type PieceSet } from '../engine/index.js';

/**
 * `--theory`: a built-in theory, or a custom piece-set file. Only a file needs the claims layer's schema
 * (zod), so the built-in theories never load it (about 80 ms of every start-up).
 */
export async function loadTheory(nameOrPath: string): Promise<PieceSet> {
  if (isBuiltinTheory(nameOrPath)) return theoryPieceSet(nameOrPath);
  return (await import('../claims/resolve-theory.js')).resolveTheory(nameOrPath);
}
