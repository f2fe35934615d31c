import type { PieceSet } from '../engine/index.js';
import type { Grassmannian } from './partition-strings.js';
import { tableRows, type TableEntry } from './structure-table.js';

/** One task: the rows of a block of λ's. Piece sets and values are plain data, so they cross threads by structured clone. */
export interface TableTask {
  readonly pieces: PieceSet;
  readonly grassmannian: Grassmannian;
  readonly lambdas: readonly string[];
}

export default function tableWorker(task: TableTask): TableEntry[] {
  return tableRows(task.pieces, task.grassmannian, task.lambdas);
}
