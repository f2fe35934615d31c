import type { TransformStep } from '../claims/index.js';

/** A symmetry of the hexagon as transform steps, with a short kebab name for claim ids. */
export interface HexagonSymmetry {
  readonly name: string;
  readonly steps: readonly TransformStep[];
}

/** The 12 symmetries of the hexagon: six rotations, and the mirror followed by each rotation. */
export const HEXAGON_SYMMETRIES: readonly HexagonSymmetry[] = [false, true].flatMap((mirror) =>
  [0, 60, 120, 180, 240, 300].map((degrees) => {
    const steps: TransformStep[] = [];
    if (mirror) steps.push({ type: 'mirror' });
    if (degrees) steps.push({ type: 'rotate', degrees });
    const name = [mirror ? 'mirror' : '', degrees ? `rotate${degrees}` : ''].filter(Boolean).join('-') || 'identity';
    return { name, steps };
  }),
);
