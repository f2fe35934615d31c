import { readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { COMMANDS, invokedCommand } from '../../../src/cli/command-registry.js';

describe('command registry (lazy loading)', () => {
  it('lists each command exactly as its module defines it', async () => {
    for (const c of COMMANDS) {
      const m = await c.load();
      expect({ command: m.command, describe: m.describe }).toEqual({ command: c.command, describe: c.describe });
    }
    expect(new Set(COMMANDS.map((c) => c.name)).size).toBe(COMMANDS.length);
  });

  it('has an entry for every command module (a new command is one registry line in src/cli/command-registry.ts)', () => {
    const files = readdirSync(new URL('../../../src/cli/commands/', import.meta.url)).filter((f) => f.endsWith('-command.ts'));
    expect(files.length).toBe(COMMANDS.length);
  });

  it('finds the invoked command as the first word that is not an option', () => {
    expect(invokedCommand(['--help'])).toBeUndefined();
    expect(invokedCommand(['status', '--db', 'x.sqlite'])).toBe('status');
  });
});
