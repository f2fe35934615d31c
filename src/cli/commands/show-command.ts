import type { CommandModule } from 'yargs';
import { enumeratePuzzles } from '../../engine/index.js';
import { resolveTheory } from '../../claims/resolve-theory.js';
import { drawPuzzleText } from '../../report/text-drawing.js';
import { regionOfSides } from '../../run/count-region.js';
import { toAppError } from '../../errors.js';
import { parseBoundaryArgs } from '../boundary-args.js';
import { runCommand } from '../run-command.js';

interface ShowArgs {
  theory: string;
  triangle?: string;
  sides?: string;
  limit: number;
}

export const showCommand: CommandModule<object, ShowArgs> = {
  command: 'show',
  describe: 'Draw every puzzle of one boundary as text',
  builder: (y) =>
    y
      .option('theory', { type: 'string', demandOption: true, describe: 'theory name or piece-set JSON path' })
      .option('triangle', { type: 'string', describe: 'λ,μ,ν on the upright triangle' })
      .option('sides', { type: 'string', describe: "six clockwise side strings; empty side '' or '-'" })
      .option('limit', { type: 'number', default: 100, describe: 'draw at most this many puzzles' }) as never,
  handler: (args) =>
    runCommand(false, () => {
      const pieces = resolveTheory(args.theory);
      const sides = parseBoundaryArgs(args);
      const region = regionOfSides(sides);
      let shown = 0;
      try {
        for (const puzzle of enumeratePuzzles(region, sides, pieces)) {
          if (shown >= args.limit) {
            process.stdout.write(`… more puzzles not drawn (raise --limit)\n`);
            break;
          }
          shown++;
          process.stdout.write(`puzzle ${shown}\n${drawPuzzleText(puzzle)}\n\n`);
        }
      } catch (e) {
        throw toAppError(e, '--sides');
      }
      if (shown === 0) process.stdout.write('no puzzles with this boundary\n');
    }),
};
