import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import type { CommandModule } from 'yargs';
import { claimJsonSchema } from '../../claims/index.js';
import { CodedError } from '../../errors/index.js';
import { runCommand } from '../run-command.js';

interface SchemaArgs {
  out?: string;
}

/** The schema file's text: stable key order from zod, two-space indent, final newline. */
export function claimSchemaText(): string {
  return `${JSON.stringify(claimJsonSchema(), null, 2)}\n`;
}

export const schemaCommand: CommandModule<object, SchemaArgs> = {
  command: 'schema',
  describe: 'Print (or write with --out) the JSON Schema of claim files, for editor completion and validation',
  builder: (y) => y.option('out', { type: 'string', describe: 'write the schema to this file instead of stdout' }) as never,
  handler: (args) =>
    runCommand(false, () => {
      const text = claimSchemaText();
      if (args.out === undefined) {
        process.stdout.write(text);
        return;
      }
      try {
        mkdirSync(dirname(args.out), { recursive: true });
        writeFileSync(args.out, text);
      } catch (e) {
        throw new CodedError('invalid_argument', { what: '--out', expected: 'a writable file path', received: `'${args.out}' (${(e as Error).message})` }, { path: '--out' });
      }
      process.stdout.write(`wrote the claim JSON Schema to ${args.out}\n`);
    }),
};
