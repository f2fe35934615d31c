import { availableParallelism } from 'node:os';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Piscina } from 'piscina';
import type { PieceSet } from '../engine/index.js';
import type { Grassmannian } from './partition-strings.js';
import { schubertStrings, tableRows, type TableEntry } from './structure-table.js';
import type { TableTask } from './table-worker.js';

export interface TableOptions {
  /** Worker threads; 1 computes on the calling thread. Default: available parallelism. */
  readonly workers?: number;
  /** Called as products σ_λ·σ_μ finish, with the number done and the number in all. */
  readonly onProgress?: (done: number, total: number) => void;
}

// Under vitest this module is a .ts source, so the worker runs the compiled file in dist/.
function workerUrl(): string {
  const here = fileURLToPath(import.meta.url);
  if (!here.endsWith('.ts')) return new URL('./table-worker.js', import.meta.url).href;
  return pathToFileURL(here.replace(/[\\/]src[\\/]products[\\/][^\\/]+\.ts$/, '/dist/products/table-worker.js')).href;
}

const order = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Every nonzero structure constant of Gr(k, n), sorted by λ, μ, ν; one sweep per (λ, μ), λ's spread over workers. */
export async function structureTable(pieces: PieceSet, g: Grassmannian, options: TableOptions = {}): Promise<TableEntry[]> {
  const lambdas = schubertStrings(g);
  const total = lambdas.length ** 2;
  let done = 0;
  const workers = Math.max(1, Math.min(options.workers ?? availableParallelism(), lambdas.length));
  let rows: TableEntry[];
  if (workers === 1 || total < 64) {
    rows = tableRows(pieces, g, lambdas, () => options.onProgress?.(++done, total));
  } else {
    const pool = new Piscina<TableTask, TableEntry[]>({ filename: workerUrl(), minThreads: workers, maxThreads: workers });
    try {
      // Blocks of a few λ's: small enough for a smooth progress bar, large enough to keep cloning cheap.
      const blocks: string[][] = [];
      const size = Math.max(1, Math.ceil(lambdas.length / (workers * 8)));
      for (let i = 0; i < lambdas.length; i += size) blocks.push(lambdas.slice(i, i + size));
      const parts = await Promise.all(
        blocks.map(async (block) => {
          const part = await pool.run({ pieces, grassmannian: g, lambdas: block });
          done += block.length * lambdas.length;
          options.onProgress?.(done, total);
          return part;
        }),
      );
      rows = parts.flat();
    } finally {
      await pool.destroy();
    }
  }
  return rows.sort((a, b) => order(a.lambda, b.lambda) || order(a.mu, b.mu) || order(a.nu, b.nu));
}
