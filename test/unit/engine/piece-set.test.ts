import { describe, expect, it } from 'vitest';
import { buildPieceSet, theoryPieceSet, type PieceSetSpec } from '../../../src/engine/index.js';
import { CodedError } from '../../../src/errors/index.js';

function errorOf(spec: PieceSetSpec): CodedError {
  try {
    buildPieceSet(spec);
  } catch (e) {
    return e as CodedError;
  }
  throw new Error('expected buildPieceSet to throw');
}

describe('built-in theories', () => {
  // Counts of unit triangles: 0- and 1-triangles up and down (4), the 10-triangle in three rotations
  // up and down (6) [common practice, no source]; each theory adds its own pieces.
  it.each([
    ['cohomology', 10],
    ['equivariant', 12],
    ['k-theory', 11],
    ['dual-k-theory', 11],
  ])('%s has %i unit pieces', (name, count) => {
    expect(theoryPieceSet(name).pieces).toHaveLength(count);
  });

  it('rejects an unknown theory, listing the valid names', () => {
    expect(() => theoryPieceSet('k-thery')).toThrow(/expected one of 'cohomology' \| 'equivariant' \| 'k-theory' \| 'dual-k-theory' \| 'ssm-nonequivariant' \| 'ssm', received 'k-thery'/);
  });
});

describe('custom piece sets', () => {
  const base: PieceSetSpec['pieces'] = [
    { edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up', 'down'] },
    { edges: { horizontal: '1', rising: '1', falling: '1' }, orientations: ['up', 'down'] },
  ];

  it('expands rotations and keeps weights', () => {
    const set = buildPieceSet({
      name: 'two-step',
      boundaryLabels: ['0', '1', '2'],
      pieces: [...base, { name: 'mixed', edges: { horizontal: '1', rising: '0', falling: '10' }, orientations: ['up'], rotations: true, weight: { type: 'variable', name: 'q' } }, { edges: { horizontal: '0', rising: '10', falling: '1' }, orientations: ['down'], rotations: true }],
    });
    expect(set.pieces.filter((p) => p.name === 'mixed')).toHaveLength(3);
    expect(set.pieces.find((p) => p.name === 'mixed')!.weight).toEqual({ type: 'variable', name: 'q' });
    expect(set.labels).toEqual(['0', '1', '2', '10']);
  });

  it('rejects duplicate pieces', () => {
    const e = errorOf({ name: 'dup', boundaryLabels: ['0', '1'], pieces: [...base, { name: 'again', edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up'] }] });
    expect(e.code).toBe('invalid_piece_set');
    expect(e.message).toMatch(/^Duplicate piece: expected each up triangle \(horizontal 0, rising 0, falling 0\) once, received it in 'piece-1' and 'again'/);
    expect(e.path).toBe('pieces[2]');
  });

  it('rejects a label no piece can match', () => {
    const e = errorOf({ name: 'lonely', boundaryLabels: ['0', '1'], pieces: [...base, { name: 'odd', edges: { horizontal: '1', rising: '0', falling: 'x' }, orientations: ['up'] }] });
    expect(e.message).toMatch(/^Unmatched label: expected some down piece with 'x' on its falling edge, received none/);
    expect(e.path).toBe('pieces[2].edges.falling');
  });

  it('rejects multi-character or repeated boundary labels', () => {
    expect(errorOf({ name: 'b', boundaryLabels: ['10'], pieces: base }).message).toMatch(/expected a single character/);
    expect(errorOf({ name: 'b', boundaryLabels: ['0', '0'], pieces: base }).message).toMatch(/expected distinct labels, received '0' twice/);
  });
});
