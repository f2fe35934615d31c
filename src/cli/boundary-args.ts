import { structureConstantSides } from '../engine/index.js';
import { CodedError } from '../errors/index.js';
import { grassmannianOfString, parseGrassmannian, parsePartition, partitionOfString, partitionText, stringOfPartition, type Grassmannian } from '../products/partition-strings.js';

export interface BoundaryArgs {
  readonly triangle?: string | undefined;
  readonly sides?: string | undefined;
  readonly partitions?: string | undefined;
  readonly grassmannian?: string | undefined;
}

/** What a triangle's λ, μ (, ν) were, for echoing: as typed, as 0/1 strings, as partitions, and Gr(k, n). */
export interface TriangleEcho {
  readonly typed: readonly string[];
  readonly strings: readonly string[];
  /** Partitions as typed back (`321`, `12.3.1`, `0`), or undefined outside the 0/1 alphabet. */
  readonly partitions: readonly string[] | undefined;
  readonly grassmannian: Grassmannian | undefined;
}

const list = (text: string) => text.split(',').map((s) => s.trim());

/** λ, μ (and ν when `count` is 3) from `--triangle` strings or from `--partitions` with `--grassmannian`. */
export function parseClassArgs(args: BoundaryArgs, count: 2 | 3): TriangleEcho {
  const names = count === 3 ? 'λ,μ,ν' : 'λ,μ';
  if (args.partitions !== undefined) {
    if (args.triangle !== undefined) throw new CodedError('invalid_argument', { what: 'Classes', expected: 'one of --triangle or --partitions', received: 'both' }, { path: '--triangle / --partitions' });
    if (args.grassmannian === undefined) {
      throw new CodedError('invalid_argument', { what: 'Grassmannian', expected: '--grassmannian k,n with --partitions', received: 'none' }, {
        path: '--grassmannian',
        hint: `e.g. --partitions ${count === 3 ? '21,1,31' : '21,1'} --grassmannian 3,7`,
      });
    }
    const g = parseGrassmannian(args.grassmannian);
    const typed = list(args.partitions);
    if (typed.length !== count) {
      throw new CodedError('invalid_argument', { what: '--partitions', expected: `${count} comma-separated partitions ${names}`, received: `${typed.length} ('${args.partitions}')` }, { path: '--partitions' });
    }
    const parts = typed.map((t) => parsePartition(t));
    return { typed, strings: parts.map((p) => stringOfPartition(p, g)), partitions: parts.map(partitionText), grassmannian: g };
  }
  if (args.triangle === undefined) {
    throw new CodedError('invalid_argument', { what: 'Classes', expected: `--triangle ${names} (0/1 strings) or --partitions ${names} with --grassmannian k,n`, received: 'neither' }, {
      path: '--triangle / --partitions',
      hint: count === 3 ? 'e.g. --triangle 0101010,0101010,1010100 or --partitions 21,21,321 --grassmannian 3,7' : 'e.g. --partitions 21,1 --grassmannian 3,7',
    });
  }
  const typed = list(args.triangle);
  if (typed.length !== count) {
    throw new CodedError('invalid_argument', { what: '--triangle', expected: `${count} comma-separated strings ${names}`, received: `${typed.length} ('${args.triangle}')` }, { path: '--triangle' });
  }
  if (typed.some((s) => [...s].length !== [...typed[0]!].length)) {
    throw new CodedError('invalid_argument', { what: '--triangle', expected: `${names} of one length`, received: `lengths ${typed.map((s) => [...s].length).join(', ')}` }, {
      path: '--triangle',
      hint: 'λ is read up the NW side, μ down the NE side, ν left to right along the bottom',
    });
  }
  const binary = typed.every((s) => /^[01]*$/.test(s));
  const g = binary ? grassmannianOfString(typed[0]!) : undefined;
  return { typed, strings: typed, partitions: binary ? typed.map((s) => partitionText(partitionOfString(s))) : undefined, grassmannian: g };
}

/** The six clockwise sides and, for a triangle, what to echo; `--sides` gives no echo. */
export function parseBoundary(args: BoundaryArgs): { sides: string[]; triangle?: TriangleEcho } {
  const triangleGiven = args.triangle !== undefined || args.partitions !== undefined;
  if (triangleGiven === (args.sides !== undefined)) {
    throw new CodedError('invalid_argument', { what: 'Boundary', expected: 'exactly one of --triangle, --partitions or --sides', received: `${triangleGiven ? 'both' : 'neither'}` }, {
      path: '--triangle / --partitions / --sides',
      hint: 'e.g. --triangle 0101010,0101010,1010100, --partitions 21,21,321 --grassmannian 3,7 or --sides 01,1,01,1,01,-',
    });
  }
  if (triangleGiven) {
    const echo = parseClassArgs(args, 3);
    const [l, m, n] = echo.strings as [string, string, string];
    return { sides: structureConstantSides(l, m, n), triangle: echo };
  }
  const parts = list(args.sides!).map((s) => (s === '-' ? '' : s));
  if (parts.length !== 6) {
    throw new CodedError('invalid_argument', { what: '--sides', expected: 'six comma-separated strings', received: `${parts.length} ('${args.sides}')` }, {
      path: '--sides',
      hint: "write an empty side as '-', e.g. --sides 01,-,01,-,10,-",
    });
  }
  return { sides: parts };
}

/** Six clockwise side strings from `--triangle λ,μ,ν`, `--partitions` or `--sides s1,…,s6` (empty side: '' or '-'). */
export function parseBoundaryArgs(args: BoundaryArgs): string[] {
  return parseBoundary(args).sides;
}

/** Text lines echoing a triangle's classes: as typed, 0/1 strings, partitions and Gr(k, n). */
export function triangleEchoLines(echo: TriangleEcho, names = ['λ', 'μ', 'ν']): string[] {
  const g = echo.grassmannian ? `  in Gr(${echo.grassmannian.k},${echo.grassmannian.n})` : '';
  return echo.typed.map((t, i) => {
    const s = echo.strings[i]!;
    const p = echo.partitions?.[i];
    const shown = [t === s ? s : `${t} → ${s}`, ...(p !== undefined && p !== t ? [`partition ${p}`] : [])];
    return `${names[i]}:       ${shown.join(', ')}${i === 0 ? g : ''}`;
  });
}

/** JSON fields echoing a triangle's classes. */
export function triangleEchoJson(echo: TriangleEcho): object {
  const keys = ['lambda', 'mu', 'nu'];
  return {
    ...Object.fromEntries(echo.strings.map((s, i) => [keys[i]!, s])),
    ...(echo.partitions ? { partitions: Object.fromEntries(echo.partitions.map((p, i) => [keys[i]!, p])) } : {}),
    ...(echo.grassmannian ? { grassmannian: [echo.grassmannian.k, echo.grassmannian.n] } : {}),
  };
}
