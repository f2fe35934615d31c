/** Whole-process commands shared by the single-count benchmarks: `puzzlesweep count` and python-dp.py on one triple. */
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const here = dirname(fileURLToPath(import.meta.url));
export const root = join(here, '..', '..');
export const cli = join(root, 'dist', 'cli', 'main.js');
const python = join(here, 'python-dp.py');

export const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const reverse = (s: string) => [...s].reverse().join('');
/** Seconds as a table shows them. */
export const sec = (x: number) => (x >= 10 ? x.toFixed(1) : x.toFixed(2));

export const countArgs = (theory: string, [l, m, n]: [string, string, string]) => [process.execPath, cli, 'count', '--theory', theory, '--triangle', `${l},${m},${n}`, '--json'];
export const pythonArgs = (theory: string, [l, m, n]: [string, string, string]) => ['python3', python, 'count', theory, `${l},-,${m},-,${reverse(n)},-`];
