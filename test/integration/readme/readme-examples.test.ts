import { spawnSync } from 'node:child_process';
import { cpSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

// The README is executable documentation: every line of its ```sh blocks runs, in order, in a fresh
// copy of the built project, and must exit with the status the README gives (`# exits N`, else 0).
// A block right after a line `<!-- not run: … -->` is skipped (it needs files or machines of the reader's).

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..', '..');

interface Example {
  readonly line: number;
  readonly command: string;
  readonly status: number;
}

/** The shell examples of a README, continuation lines joined. */
function shellExamples(readme: string): Example[] {
  const lines = readme.split('\n');
  const out: Example[] = [];
  let inBlock = false;
  let skip = false;
  let pending = '';
  let start = 0;
  lines.forEach((text, i) => {
    if (!inBlock) {
      if (/^```sh\s*$/.test(text)) {
        inBlock = true;
        skip = i > 0 && /^<!-- not run\b/.test(lines[i - 1]!);
      }
      return;
    }
    if (/^```\s*$/.test(text)) {
      inBlock = false;
      return;
    }
    if (skip) return;
    if (pending === '') start = i + 1;
    if (text.endsWith('\\')) {
      pending += `${text.slice(0, -1)} `;
      return;
    }
    const full = `${pending}${text}`.trim();
    pending = '';
    if (full === '' || full.startsWith('#')) return;
    const status = /#\s*exits\s+(\d+)\s*$/.exec(full);
    out.push({ line: start, command: full, status: status ? Number(status[1]) : 0 });
  });
  return out;
}

// `npm install` and `npm test` are not run (this test is part of `npm test`; the copy shares our
// node_modules); `npm start` is `npm run build` then `demo`, and the copy is built already.
function asRun(command: string, cli: string): string | undefined {
  const c = command.replace(/\s+#.*$/, '');
  if (/^npm (install|test)\b/.test(c)) return undefined;
  if (/^npm start\b/.test(c)) return `${cli} demo`;
  return c.replace(/^npx puzzlesweep\b/, cli);
}

describe('README shell examples', () => {
  const copy = mkdtempSync(join(tmpdir(), 'puzzlesweep-readme-'));
  beforeAll(() => {
    const files = spawnSync('git', ['ls-files', '-z'], { cwd: root, encoding: 'utf8' }).stdout.split('\0').filter(Boolean);
    for (const f of files.filter((f) => existsSync(join(root, f)))) {
      mkdirSync(dirname(join(copy, f)), { recursive: true });
      cpSync(join(root, f), join(copy, f));
    }
    cpSync(join(root, 'dist'), join(copy, 'dist'), { recursive: true });
    symlinkSync(join(root, 'node_modules'), join(copy, 'node_modules'), 'dir');
  });
  afterAll(() => rmSync(copy, { recursive: true, force: true }));

  it('run in order on a built copy and exit as the README says', () => {
    const readme = readFileSync(join(copy, 'README.md'), 'utf8');
    const examples = shellExamples(readme);
    // The README shows well over twenty commands; a broken extractor must not pass by finding none.
    expect(examples.length).toBeGreaterThan(20);
    const cli = `node ${JSON.stringify(join(copy, 'dist', 'cli', 'main.js'))}`;
    const failures: string[] = [];
    for (const ex of examples) {
      const run = asRun(ex.command, cli);
      if (run === undefined) continue;
      const r = spawnSync('bash', ['-c', run], { cwd: copy, encoding: 'utf8', timeout: 240_000, env: { ...process.env, FORCE_COLOR: '0' } });
      if (r.status !== ex.status) failures.push(`README.md:${ex.line}: ${ex.command}\n  expected exit ${ex.status}, received ${r.status}\n  ${(r.stderr || r.stdout).trim().split('\n').slice(0, 6).join('\n  ')}`);
    }
    expect(failures).toEqual([]);
  }, 1_500_000);

  it('runs its JavaScript examples against the built package (imported by name, as a user would)', () => {
    const readme = readFileSync(join(root, 'README.md'), 'utf8');
    const blocks = [...readme.matchAll(/^```js\n([\s\S]*?)^```$/gm)].map((m) => m[1]!);
    expect(blocks.length).toBeGreaterThan(0);
    blocks.forEach((code, i) => {
      // Inside the package folder, `import … from 'puzzlesweep'` resolves through package.json "exports".
      const file = join(copy, `readme-example-${i}.mjs`);
      writeFileSync(file, code);
      const r = spawnSync(process.execPath, [file], { cwd: copy, encoding: 'utf8', timeout: 240_000 });
      expect(r.status, `README js block ${i + 1}: ${r.stderr}`).toBe(0);
    });
  }, 600_000);
});
