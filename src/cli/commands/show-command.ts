import type { CommandModule } from 'yargs';
import { countBoundary, enumeratePuzzles, fillingCountSemiring, type PieceSet, type Puzzle, type Region, type SafeInt } from '../../engine/index.js';
import { resolveTheory } from '../../claims/resolve-theory.js';
import { drawPuzzleText } from '../../report/text-drawing.js';
import { boundaryTitle, drawPuzzlesSvg } from '../../report/svg-drawing.js';
import { drawPuzzlesTikz } from '../../report/tikz-drawing.js';
import { regionOfSides } from '../../claims/count-region.js';
import { underFlag } from '../run-command.js';
import { parseBoundary, triangleEchoLines } from '../boundary-args.js';
import { classOptions } from '../class-options.js';
import { announceLargeRegion } from '../size-notice.js';
import { runCommand } from '../run-command.js';
import { writeOutputFile } from '../write-output-file.js';

interface ShowArgs {
  theory: string;
  triangle?: string;
  partitions?: string;
  grassmannian?: string;
  sides?: string;
  'picture-only': boolean;
  limit: number;
  svg?: string;
  tikz?: string;
}

export const showCommand: CommandModule<object, ShowArgs> = {
  command: 'show',
  describe: 'Draw every puzzle of one boundary as text, or into an SVG picture or a LaTeX/TikZ document',
  builder: (y) =>
    classOptions(y, 'λ,μ,ν')
      .option('theory', { type: 'string', demandOption: true, describe: 'theory name or piece-set JSON path' })
      .option('sides', { type: 'string', describe: "six clockwise side strings; empty side '' or '-'" })
      .option('limit', { type: 'number', default: 100, describe: 'draw at most this many puzzles' })
      .option('svg', { type: 'string', describe: 'write the puzzles side by side into this SVG file instead of printing them' })
      .option('tikz', { type: 'string', describe: 'write a standalone LaTeX picture, one tikzpicture per puzzle, into this file' })
      .option('picture-only', { type: 'boolean', default: false, describe: 'with --tikz: only the colour definitions and tikzpictures, to \\input into your own document' }) as never,
  handler: (args) =>
    runCommand(false, () => {
      const pieces = resolveTheory(args.theory);
      const { sides, triangle } = parseBoundary(args);
      const region = regionOfSides(sides);
      // The total comes from the counting sweep first, so a large boundary announces its size before drawing.
      announceLargeRegion(region, `counting the puzzles in ${pieces.name}`);
      const total = totalPuzzles(region, sides, pieces);
      if (BigInt(total) > BigInt(args.limit)) process.stderr.write(`${total} puzzles; drawing the first ${args.limit} (--limit)…\n`);
      if (triangle) process.stdout.write(`${triangleEchoLines(triangle).join('\n')}\n`);
      if (args.svg === undefined && args.tikz === undefined) return printText(region, sides, pieces, args.limit, total);
      const { puzzles, more } = collect(region, sides, pieces, args.limit);
      const what = triangle ? `λ=${triangle.typed[0]} μ=${triangle.typed[1]} ν=${triangle.typed[2]}` : boundaryTitle(sides);
      const title = `${pieces.name}: ${what}${more ? ` (first ${puzzles.length} of ${total} puzzles)` : ''}`;
      if (args.svg !== undefined) writeOutputFile(args.svg, drawPuzzlesSvg(puzzles, { title }), '--svg');
      if (args.tikz !== undefined) writeOutputFile(args.tikz, drawPuzzlesTikz(puzzles, { title, pictureOnly: args['picture-only'] }), '--tikz');
      const files = [args.svg, args.tikz].filter((f) => f !== undefined).join(' and ');
      process.stdout.write(`drew ${puzzles.length} of ${total} puzzle${total === 1 ? '' : 's'} into ${files}${more ? ' (raise --limit to draw more)' : ''}\n`);
    }),
};

function collect(region: Region, sides: readonly string[], pieces: PieceSet, limit: number): { puzzles: Puzzle[]; more: boolean } {
  const puzzles: Puzzle[] = [];
  try {
    for (const puzzle of enumeratePuzzles(region, sides, pieces)) {
      if (puzzles.length >= limit) return { puzzles, more: true };
      puzzles.push(puzzle);
    }
  } catch (e) {
    throw underFlag(e, '--sides');
  }
  return { puzzles, more: false };
}

function totalPuzzles(region: Region, sides: readonly string[], pieces: PieceSet): SafeInt {
  try {
    return countBoundary(region, sides, pieces, { semiring: fillingCountSemiring });
  } catch (e) {
    throw underFlag(e, '--sides');
  }
}

function printText(region: Region, sides: readonly string[], pieces: PieceSet, limit: number, total: SafeInt): void {
  const { puzzles, more } = collect(region, sides, pieces, limit);
  puzzles.forEach((puzzle, k) => process.stdout.write(`puzzle ${k + 1}\n${drawPuzzleText(puzzle)}\n\n`));
  if (more) process.stdout.write(`drew ${puzzles.length} of ${total} puzzles (raise --limit to draw more)\n`);
  if (puzzles.length === 0) process.stdout.write('no puzzles with this boundary\n');
}
