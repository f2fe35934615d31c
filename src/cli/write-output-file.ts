import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { CodedError } from '../errors/index.js';

/** Writes a generated file, creating its directory; a failure names the option that gave the path. */
export function writeOutputFile(file: string, text: string, option: string): void {
  try {
    makeDirectories(dirname(file));
    writeFileSync(file, text);
  } catch (e) {
    throw new CodedError('invalid_argument', { what: 'Output file', expected: 'a writable path', received: `'${file}' (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})` }, {
      path: option,
      hint: 'choose a file in a directory you can write to',
    });
  }
}

// Missing ancestors are created one by one: a recursive mkdir can spin forever under /proc.
function makeDirectories(dir: string): void {
  const missing: string[] = [];
  for (let d = dir; !existsSync(d) && dirname(d) !== d; d = dirname(d)) missing.unshift(d);
  for (const d of missing) mkdirSync(d);
}
