import { countRegion } from '../claims/count-region.js';
import { resolveTheory } from '../claims/resolve-theory.js';
import type { PieceSet } from '../engine/index.js';
import type { ValueForm } from '../report/root-form.js';
import { expandedText, valueText } from '../report/value-json.js';

/**
 * A stored or measured value text in the chosen --form. It is recomputed as the region's own value and
 * rewritten only when that recomputation gives the very same expanded text; any other measure (a
 * statistic, a completed region, a formula) keeps its canonical text.
 */
export function valueInForm(text: string, sides: readonly string[], theory: PieceSet | string, form: ValueForm): string {
  if (form === 'expanded' || !/y\d/.test(text)) return text;
  try {
    const pieces = typeof theory === 'string' ? resolveTheory(theory) : theory;
    const own = countRegion(pieces, sides).value;
    return expandedText(own) === text ? valueText(own, form) : text;
  } catch {
    return text;
  }
}
