import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { writeOutputFile } from '../../../src/cli/write-output-file.js';
import { CodedError } from '../../../src/errors/index.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-out-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('writeOutputFile', () => {
  it('creates missing folders and writes the text', () => {
    const file = join(dir, 'a', 'b', 'p.svg');
    writeOutputFile(file, '<svg/>', '--svg');
    expect(readFileSync(file, 'utf8')).toBe('<svg/>');
  });

  it('names the option that gave an unwritable path', () => {
    writeFileSync(join(dir, 'plain'), '');
    let error: unknown;
    try {
      writeOutputFile(join(dir, 'plain', 'x.tex'), '', '--tikz');
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(CodedError);
    expect(error).toMatchObject({ code: 'invalid_argument', path: '--tikz', message: expect.stringMatching(/^Output file: expected a writable path, received '.*x\.tex' \(E[A-Z]+\)$/) });
  });
});
