import { structureConstantSides } from '../engine/index.js';
import { AppError } from '../errors.js';

export interface BoundaryArgs {
  readonly triangle?: string | undefined;
  readonly sides?: string | undefined;
}

/** Six clockwise side strings from `--triangle λ,μ,ν` or `--sides s1,…,s6` (empty side: '' or '-'). */
export function parseBoundaryArgs(args: BoundaryArgs): string[] {
  if ((args.triangle === undefined) === (args.sides === undefined)) {
    throw new AppError('invalid_argument', `Boundary: expected exactly one of --triangle or --sides, received ${args.triangle === undefined ? 'neither' : 'both'}`, {
      path: '--triangle / --sides',
      hint: 'e.g. --triangle 0101,0101,0110 or --sides 01,1,01,1,01,-',
    });
  }
  if (args.triangle !== undefined) {
    const parts = args.triangle.split(',');
    if (parts.length !== 3) {
      throw new AppError('invalid_argument', `--triangle: expected three comma-separated strings λ,μ,ν, received ${parts.length} ('${args.triangle}')`, { path: '--triangle' });
    }
    const [l, m, n] = parts as [string, string, string];
    if (l.length !== m.length || m.length !== n.length) {
      throw new AppError('invalid_argument', `--triangle: expected λ, μ, ν of one length, received lengths ${l.length}, ${m.length}, ${n.length}`, {
        path: '--triangle',
        hint: 'λ is read up the NW side, μ down the NE side, ν left to right along the bottom',
      });
    }
    return structureConstantSides(l, m, n);
  }
  const parts = args.sides!.split(',').map((s) => (s === '-' ? '' : s));
  if (parts.length !== 6) {
    throw new AppError('invalid_argument', `--sides: expected six comma-separated strings, received ${parts.length} ('${args.sides}')`, {
      path: '--sides',
      hint: "write an empty side as '-', e.g. --sides 01,-,01,-,10,-",
    });
  }
  return parts;
}
