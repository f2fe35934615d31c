import { afterEach, describe, expect, it, vi } from 'vitest';
import { pieceSetFromJson } from '../../../src/claims/resolve-theory.js';
import { theoryPieceSet, type PieceSet } from '../../../src/engine/index.js';

const key = (s: PieceSet) => s.pieces.map((p) => `${p.orientation}:${p.labels.join('/')}:${JSON.stringify(p.weight)}`).sort();

describe('piece sets in the old positional form', () => {
  afterEach(() => vi.restoreAllMocks());

  // The old form listed labels clockwise: up (left, right, bottom), down (top, right, left)
  // [the previous README's convention]; read that way, this is the equivariant piece set.
  const legacy = {
    name: 'old-equivariant',
    boundaryLabels: ['0', '1'],
    pieces: [
      { name: '0-triangle', labels: ['0', '0', '0'], orientations: ['up', 'down'] },
      { name: '1-triangle', labels: ['1', '1', '1'], orientations: ['up', 'down'] },
      { name: '10-triangle', labels: ['0', '10', '1'], orientations: ['up', 'down'], rotations: true },
      { name: 'equivariant-upper', labels: ['0', '1', 'eq'], orientations: ['up'] },
      { name: 'equivariant', labels: ['eq', '0', '1'], orientations: ['down'], weight: 'position' },
    ],
  };

  it('reads them as the same pieces, with a deprecation warning naming the new form', () => {
    const warn = vi.spyOn(process, 'emitWarning').mockImplementation(() => undefined);
    expect(key(pieceSetFromJson(legacy))).toEqual(key(theoryPieceSet('equivariant')));
    expect(warn).toHaveBeenCalledTimes(1);
    expect(String(warn.mock.calls[0]![0])).toMatch(/"edges": \{ "horizontal"/);
  });

  it('splits an old piece whose up and down readings differ (no rotations) into one piece per orientation', () => {
    vi.spyOn(process, 'emitWarning').mockImplementation(() => undefined);
    const set = pieceSetFromJson({
      name: 'split',
      boundaryLabels: ['0', '1'],
      pieces: [
        { labels: ['0', '0', '0'], orientations: ['up', 'down'] },
        { labels: ['1', '1', '1'], orientations: ['up', 'down'] },
        { name: 'both', labels: ['0', '1', '1'], orientations: ['up', 'down'] },
      ],
    });
    // Each orientation keeps its own clockwise triple, exactly as the old form meant it.
    const both = set.pieces.filter((p) => p.name === 'both').map((p) => `${p.orientation}:${p.labels.join('')}`);
    expect(both.sort()).toEqual(['down:011', 'up:011']);
  });
});
