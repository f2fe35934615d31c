import { describe, expect, it } from 'vitest';
import { enumeratePuzzles, structureConstantSides, theoryPieceSet, triangleRegion } from '../../../src/engine/index.js';
import { drawPuzzlesTikz, texText } from '../../../src/report/tikz-drawing.js';

// Three equivariant puzzles for λ=1001, μ=0110, ν=1010 in Gr(2,4): a small input chosen so
// that several pictures and a rhombus appear (common practice, no source).
const equivariant = theoryPieceSet('equivariant');
const triangle = [...enumeratePuzzles(triangleRegion(4), structureConstantSides('1001', '0110', '1010'), equivariant)];

function environments(tex: string): string[] {
  const stack: string[] = [];
  const seen: string[] = [];
  for (const m of tex.matchAll(/\\(begin|end)\{([^}]+)\}/g)) {
    if (m[1] === 'begin') stack.push(m[2]!), seen.push(m[2]!);
    else if (stack.pop() !== m[2]) throw new Error(`unbalanced \\end{${m[2]}}`);
  }
  if (stack.length) throw new Error(`unclosed ${stack.join(', ')}`);
  return seen;
}

function bracesBalanced(tex: string): boolean {
  let depth = 0;
  for (const c of tex.replace(/\\[{}$]/g, '')) {
    if (c === '{') depth++;
    if (c === '}' && --depth < 0) return false;
  }
  return depth === 0;
}

describe('drawPuzzlesTikz', () => {
  it('writes one tikzpicture per puzzle and one fill per unit triangle, in balanced environments', () => {
    expect(triangle.length).toBeGreaterThan(1);
    const tex = drawPuzzlesTikz(triangle, { title: 'c_{λμ}^ν & more | 100%' });
    const envs = environments(tex);
    expect(envs.filter((e) => e === 'tikzpicture').length).toBe(triangle.length);
    expect(envs[0]).toBe('document');
    expect(bracesBalanced(tex)).toBe(true);
    // A triangle of side 4 has 4² = 16 unit triangles (elementary geometry, common practice, no source).
    expect((tex.match(/^\\fill\[/gm) ?? []).length).toBe(16 * triangle.length);
    expect(tex.indexOf('\\tikzset')).toBeLessThan(tex.indexOf('\\begin{document}'));
    expect(tex).toMatch(/\$y_\{\d+\} - y_\{\d+\}\$/);
  });

  it('is a standalone picture, or with pictureOnly only definitions and pictures for \\input; colours named by piece kind', () => {
    const doc = drawPuzzlesTikz(triangle);
    expect(doc).toMatch(/^\\documentclass\[[^\]]*\]\{standalone\}/);
    const part = drawPuzzlesTikz(triangle, { pictureOnly: true });
    expect(part).not.toMatch(/\\documentclass|\\begin\{document\}/);
    expect(environments(part).filter((e) => e === 'tikzpicture').length).toBe(triangle.length);
    // Every colour a picture uses is defined in the same file, and the rhombus colour says what it fills.
    const defined = new Set([...part.matchAll(/\\definecolor\{([A-Za-z]+)\}/g)].map((m) => m[1]));
    expect(defined.has('pieceRhombus')).toBe(true);
    for (const m of part.matchAll(/\\fill\[([A-Za-z]+)\]/g)) expect(defined.has(m[1]!)).toBe(true);
  });

  it('escapes LaTeX specials in plain text', () => {
    // The escapes are the standard LaTeX spellings (Lamport, LaTeX: A Document Preparation System, 1994).
    expect(texText('a_b & 50% #1 {x}')).toBe('a\\_b \\& 50\\% \\#1 \\{x\\}');
    expect(texText('1 – 2')).toBe('1 -- 2');
  });
});
