import type { CommandModule } from 'yargs';
import { enumeratePuzzles, type PieceSet, type Puzzle, type Region } from '../../engine/index.js';
import { resolveTheory } from '../../claims/resolve-theory.js';
import { drawPuzzleText } from '../../report/text-drawing.js';
import { boundaryTitle, drawPuzzlesSvg } from '../../report/svg-drawing.js';
import { drawPuzzlesTikz } from '../../report/tikz-drawing.js';
import { regionOfSides } from '../../claims/count-region.js';
import { toAppError } from '../../errors.js';
import { parseBoundaryArgs } from '../boundary-args.js';
import { runCommand } from '../run-command.js';
import { writeOutputFile } from '../write-output-file.js';

interface ShowArgs {
  theory: string;
  triangle?: string;
  sides?: string;
  limit: number;
  svg?: string;
  tikz?: string;
}

export const showCommand: CommandModule<object, ShowArgs> = {
  command: 'show',
  describe: 'Draw every puzzle of one boundary as text, or into an SVG picture or a LaTeX/TikZ document',
  builder: (y) =>
    y
      .option('theory', { type: 'string', demandOption: true, describe: 'theory name or piece-set JSON path' })
      .option('triangle', { type: 'string', describe: 'λ,μ,ν on the upright triangle' })
      .option('sides', { type: 'string', describe: "six clockwise side strings; empty side '' or '-'" })
      .option('limit', { type: 'number', default: 100, describe: 'draw at most this many puzzles' })
      .option('svg', { type: 'string', describe: 'write the puzzles side by side into this SVG file instead of printing them' })
      .option('tikz', { type: 'string', describe: 'write a standalone LaTeX document, one tikzpicture per puzzle, into this file' }) as never,
  handler: (args) =>
    runCommand(false, () => {
      const pieces = resolveTheory(args.theory);
      const sides = parseBoundaryArgs(args);
      const region = regionOfSides(sides);
      if (args.svg === undefined && args.tikz === undefined) return printText(region, sides, pieces, args.limit);
      const { puzzles, more } = collect(region, sides, pieces, args.limit);
      const title = `${pieces.name}: ${boundaryTitle(sides)}${more ? ` (first ${puzzles.length} puzzles)` : ''}`;
      if (args.svg !== undefined) writeOutputFile(args.svg, drawPuzzlesSvg(puzzles, { title }), '--svg');
      if (args.tikz !== undefined) writeOutputFile(args.tikz, drawPuzzlesTikz(puzzles, { title }), '--tikz');
      const files = [args.svg, args.tikz].filter((f) => f !== undefined).join(' and ');
      process.stdout.write(`drew ${puzzles.length} puzzle${puzzles.length === 1 ? '' : 's'} into ${files}${more ? ' (more not drawn: raise --limit)' : ''}\n`);
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
    throw toAppError(e, '--sides');
  }
  return { puzzles, more: false };
}

function printText(region: Region, sides: readonly string[], pieces: PieceSet, limit: number): void {
  const { puzzles, more } = collect(region, sides, pieces, limit);
  puzzles.forEach((puzzle, k) => process.stdout.write(`puzzle ${k + 1}\n${drawPuzzleText(puzzle)}\n\n`));
  if (more) process.stdout.write(`… more puzzles not drawn (raise --limit)\n`);
  if (puzzles.length === 0) process.stdout.write('no puzzles with this boundary\n');
}
