import { describe, expect, it } from 'vitest';
import { theoryPieceSet } from '../../../src/engine/index.js';
import { tableRows, schubertStrings } from '../../../src/products/structure-table.js';
import { tableCsv, tableJson, tableTex } from '../../../src/products/table-formats.js';

describe('table formats', () => {
  const g = { k: 2, n: 4 };
  const rows = tableRows(theoryPieceSet('cohomology'), g, schubertStrings(g));

  it('lists the six Schubert classes of Gr(2,4) [binomial(4,2) = 6, common practice]', () => {
    expect(schubertStrings(g)).toEqual(['0011', '0101', '0110', '1001', '1010', '1100']);
  });

  it('writes CSV with the documented header, one line per entry, partitions after the strings', () => {
    const lines = tableCsv(rows, 'roots').trimEnd().split('\n');
    expect(lines[0]).toBe('lambda,mu,nu,value,lambda_partition,mu_partition,nu_partition');
    expect(lines).toHaveLength(rows.length + 1);
    // σ_1·σ_1 ∋ σ_11 with coefficient 1 [Pieri's rule; Fulton, Young Tableaux, 1997]
    expect(lines).toContain('0101,0101,0110,1,1,1,11');
  });

  it('writes JSON with a format version and TeX with one row per entry', () => {
    const json = tableJson('cohomology', g, rows, 'roots') as { formatVersion: number; grassmannian: number[]; entries: unknown[] };
    expect(json.formatVersion).toBe(2);
    expect(json.grassmannian).toEqual([2, 4]);
    expect(json.entries).toHaveLength(rows.length);
    const tex = tableTex('cohomology', g, rows, 'roots');
    expect(tex.match(/\\\\$/gm)).toHaveLength(rows.length + 1); // rows plus the header
    expect(tex).toContain('$(1)$ & $(1)$ & $(1,1)$ & $1$ \\\\');
  });
});
