import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';

// The built package entry, found the way a consumer's `import 'puzzlesweep'` finds it: package.json "exports".
const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { exports: { '.': { import: string } } };
const entry = pathToFileURL(join(root, pkg.exports['.'].import)).href;

describe('the library entry (built dist)', () => {
  it('expands a product: σ_1·σ_1 = σ_2 + σ_11 in Gr(2,4) [Pieri’s rule; Fulton, Young Tableaux, 1997]', async () => {
    const api = (await import(entry)) as typeof import('../../../src/index.js');
    const product = api.expand({ theory: 'cohomology', lambda: [1], mu: [1], grassmannian: [2, 4] });
    expect(product.formatVersion).toBe(api.JSON_FORMAT_VERSION);
    expect(product.products.map((t) => [t.partition, t.value]).sort()).toEqual([
      ['11', 1],
      ['2', 1],
    ]);
  });

  it('counts c_{21,21}^{321} = 2 from partitions and finds its two puzzles [value from memory]', async () => {
    const api = (await import(entry)) as typeof import('../../../src/index.js');
    expect(api.count({ theory: 'cohomology', lambda: [2, 1], mu: [2, 1], nu: [3, 2, 1], grassmannian: [3, 6] })).toMatchObject({ value: 2, puzzles: 2 });
    const g = { k: 3, n: 6 };
    const triangle = [[2, 1], [2, 1], [3, 2, 1]].map((p) => api.stringOfPartition(p, g)) as [string, string, string];
    expect([...api.enumeratePuzzles({ theory: 'cohomology', triangle })]).toHaveLength(2);
  });

  it('tabulates Gr(2,5) in K-theory on two workers: σ_1·σ_1 = σ_2 + σ_11 − σ_21 [Lenart’s K-Pieri rule, 2000]', async () => {
    const api = (await import(entry)) as typeof import('../../../src/index.js');
    const t = await api.table({ theory: 'k-theory', grassmannian: [2, 5], workers: 2 });
    const square = t.entries.filter((e) => e.partitions.lambda === '1' && e.partitions.mu === '1').map((e) => [e.partitions.nu, e.value]);
    expect(square.sort()).toEqual([
      ['11', 1],
      ['2', 1],
      ['21', -1],
    ]);
  });

  it('tabulates and expands theories known by localization only, as the CLI does', async () => {
    const api = (await import(entry)) as typeof import('../../../src/index.js');
    // c_SM of P¹ solved by hand from c(C)|_01 = 1 − χ, c(C)|_10 = 1, c(pt)|_10 = χ, χ = y2 − y1: c(pt)² = χ·c(pt).
    const t = await api.table({ theory: 'ssm-chern', grassmannian: [1, 2] });
    expect(t.theory).toBe('ssm-chern');
    expect(t.entries.map((e) => `${e.lambda},${e.mu},${e.nu}`)).toEqual(['01,01,01', '01,01,10', '01,10,10', '10,01,10', '10,10,10']);
    expect(t.entries.at(-1)!.value).toMatchObject({ text: 'y2 - y1' });
    // [O_line]² = (1 − t2/t3)[O_line] + (t2/t3)[O_pt] in K_T(P²), by hand from the restrictions (1 − t_i/t_j products).
    const p = api.expand({ theory: 'equivariant-k-theory', lambda: '010', mu: '010' });
    expect(p.products.map((x) => x.nu)).toEqual(['010', '100']);
  });
});
