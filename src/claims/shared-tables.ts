import type { SharedTables } from './claim-api.js';
import type { Layout } from './plan-claim.js';

/** Parts a cell's table is cut into, so that several workers needing one cell each compute some of it. */
export const TABLE_PARTS = 8;
// Shared tables of one class above this many entries (8 bytes each) are not allocated: workers keep their own.
const MAX_SHARED_ENTRIES = 1 << 24;
const MAX_CELLS = 1 << 16;

/** Where each cell of a class lives in its shared table: cells are numbered like the scan's cell key. */
export interface TableShape {
  readonly cells: number;
  /** Start of each cell's values (entries), and its size. */
  readonly offsets: Float64Array;
  readonly sizes: Float64Array;
  readonly entries: number;
}

/**
 * Cells of a class: one per content of every group of several sides (a group of one side reads all its
 * strings in one list). Cell key = mixed radix of the groups' content indices, the last group least significant.
 */
export function tableShape(layout: Layout): TableShape | undefined {
  const radix = layout.groups.map((g) => g.contents.length);
  const cells = radix.reduce((p, n) => p * n, 1);
  if (cells === 0 || cells > MAX_CELLS) return undefined;
  const offsets = new Float64Array(cells);
  const sizes = new Float64Array(cells);
  let entries = 0;
  for (let key = 0; key < cells; key++) {
    let rest = key;
    let size = 1;
    for (let g = layout.groups.length - 1; g >= 0; g--) {
      const group = layout.groups[g]!;
      const c = rest % radix[g]!;
      rest = (rest - c) / radix[g]!;
      if (group.sides.length === 1) size = c === 0 ? size * Number(group.size) : 0;
      else size *= Number(group.contents[c]!.strings) ** group.sides.length;
    }
    offsets[key] = entries;
    sizes[key] = size;
    entries += size;
  }
  return entries <= MAX_SHARED_ENTRIES ? { cells, offsets, sizes, entries } : undefined;
}

/** Shared memory for a class's value tables (allocated once by the main thread, handed to every chunk task). */
export function allocateSharedTables(id: string, shape: TableShape): SharedTables {
  return { id, values: new SharedArrayBuffer(Math.max(8, shape.entries * 8)), state: new SharedArrayBuffer(Math.max(4, shape.cells * TABLE_PARTS * 4)) };
}
