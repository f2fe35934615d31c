import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { enumeratePuzzles, makeRegion, structureConstantSides, theoryPieceSet, triangleRegion } from '../../../src/engine/index.js';
import { drawPuzzlesTikz } from '../../../src/report/tikz-drawing.js';

// The same pictures as test/unit/report/tikz-drawing.test.ts, compiled by a real pdflatex when one is installed.
const equivariant = theoryPieceSet('equivariant');
const triangle = [...enumeratePuzzles(triangleRegion(4), structureConstantSides('1001', '0110', '1010'), equivariant)];
const hexagon = [...enumeratePuzzles(makeRegion([2, 1, 2, 1, 2, 1]), ['01', '1', '01', '1', '01', '1'], equivariant)];

describe('drawPuzzlesTikz with pdflatex', () => {
  const pdflatex = spawnSync('pdflatex', ['--version']).status === 0;
  it.skipIf(!pdflatex)('compiles with pdflatex', () => {
    const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-tikz-'));
    try {
      writeFileSync(join(dir, 'p.tex'), drawPuzzlesTikz([...triangle, ...hexagon], { title: 'equivariant: 1001 | – | 0110' }));
      execFileSync('pdflatex', ['-interaction=nonstopmode', '-halt-on-error', 'p.tex'], { cwd: dir, stdio: 'pipe', timeout: 120_000 });
      expect(existsSync(join(dir, 'p.pdf'))).toBe(true);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
