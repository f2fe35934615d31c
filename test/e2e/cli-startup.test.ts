import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { COMMANDS } from '../../src/cli/command-registry.js';
import { CLI, cli } from './cli-process.js';

// The start-up work (issue 8): dist/cli/main.js is an esbuild bundle (src/build/bundle-cli.mjs), `--help` prints
// the copy yargs rendered at build time, and yargs no longer renders a command's help before running it.
describe('CLI start-up shortcuts keep the output', () => {
  it("prints the build's copy of --help byte for byte as yargs renders it (common practice, no source)", () => {
    const fast = cli(['--help']);
    const rendered = cli(['--help'], { PUZZLESWEEP_RENDER_HELP: '1' });
    expect(fast.status).toBe(0);
    expect(rendered.status).toBe(0);
    expect(fast.stdout).toBe(rendered.stdout);
    expect(fast.stderr).toBe('');
    // yargs would translate its own words under another locale; the CLI is English throughout, so the copy holds there too.
    expect(cli(['--help'], { PUZZLESWEEP_RENDER_HELP: '1', LANG: 'de_DE.UTF-8', LC_ALL: 'de_DE.UTF-8' }).stdout).toBe(fast.stdout);
    // Every registered command is listed (its name at the start of a help line), with --help and --version.
    for (const c of COMMANDS) expect(rendered.stdout).toMatch(new RegExp(`^ +puzzlesweep ${c.command.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')} `, 'm'));
    expect(rendered.stdout).toMatch(/^ +--help /m);
    expect(rendered.stdout).toMatch(/^ +--version /m);
  });

  it("prints the package's version for --version (package.json)", () => {
    const version = (JSON.parse(readFileSync('package.json', 'utf8')) as { version: string }).version;
    // From another working directory, through a symbolic link (as npm installs the bin), not only from the repo root.
    const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-version-'));
    symlinkSync(resolve(CLI), join(dir, 'puzzlesweep'));
    const r = spawnSync(process.execPath, [join(dir, 'puzzlesweep'), '--version'], { encoding: 'utf8', cwd: dir });
    expect(r.status).toBe(0);
    expect(r.stdout.trim()).toBe(version);
  });

  it('still prints a command’s own help, and a refused command prints the coded error without help', () => {
    const help = cli(['count', '--help']);
    expect(help.status).toBe(0);
    expect(help.stdout).toMatch(/^puzzlesweep count/m);
    expect(help.stdout).toContain('--theory');
    const bad = cli(['count', '--theory', 'cohomology', '--triangle', '0101,0110,1001', '--no-such-flag']);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain("✖ Option: expected an option of 'count', received '--no-such-flag'\n  → at --no-such-flag");
    expect(bad.stderr).toContain('[unknown_option]');
    expect(bad.stderr).not.toContain('Options:');
  });

  it('counts a localization-only theory, whose references count-command now loads on demand', () => {
    // Which value is right is crosscheck's business (test/math); here: the lazily loaded path runs and says so.
    const r = cli(['count', '--theory', 'ssm-chern', '--triangle', '0101,0101,1001', '--json']);
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout)).toMatchObject({ theory: 'ssm-chern', source: 'localization', puzzles: null });
  });
});
