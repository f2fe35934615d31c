/**
 * `npm run bench`: runs every `*-benchmark.ts` module in this folder (each default-exports an async
 * function returning a markdown section) and writes test/bench/results.md with the machine's details.
 */
import { existsSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { availableParallelism, cpus, totalmem } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const only = process.argv.slice(2);
const modules = readdirSync(here)
  .filter((f) => f.endsWith('-benchmark.ts'))
  .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
  .sort();

const sections: string[] = [];
for (const file of modules) {
  process.stderr.write(`running ${file}\n`);
  const mod = (await import(pathToFileURL(join(here, file)).href)) as { default: () => Promise<string> };
  sections.push(await mod.default());
}

const header = [
  '# Benchmark results',
  '',
  `Measured ${new Date().toISOString().slice(0, 10)} with \`npm run bench\` on ${availableParallelism()} cores (${cpus()[0]?.model ?? 'unknown CPU'}), ${(totalmem() / 2 ** 30).toFixed(0)} GiB, Node ${process.version}.`,
  'Every number below was measured by that run; nothing is estimated. Peak memory is the maximum resident set size of a fresh process running only that case.',
  '',
].join('\n');
const out = join(here, 'results.md');
// `npm run bench -- engine` reruns some modules: their sections replace the stored ones with the same
// heading, and the other modules' sections are kept as they were measured.
const heading = (section: string) => section.split('\n', 1)[0]!;
const stored = existsSync(out) && only.length > 0 ? readFileSync(out, 'utf8').split(/^(?=## )/m).slice(1).map((x) => x.trimEnd()) : [];
const fresh = new Map(sections.map((x) => [heading(x), x]));
const merged = stored.map((x) => fresh.get(heading(x)) ?? x);
for (const x of sections) if (!stored.some((y) => heading(y) === heading(x))) merged.push(x);
const partial = stored.length > 0 ? `Partial run: ${sections.map(heading).map((h) => `"${h.slice(3)}"`).join(', ')} measured on that date; the other sections are kept from earlier runs.\n\n` : '';
writeFileSync(out, `${header}\n${partial}${merged.join('\n\n')}\n`);
process.stderr.write(`wrote ${out}\n`);
