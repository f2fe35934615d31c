import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';

const CLI = resolve('dist/cli/main.js');
const work = mkdtempSync(join(tmpdir(), 'puzzlesweep-subst-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const cli = (...args: string[]) => spawnSync('node', [CLI, ...args], { cwd: work, encoding: 'utf8' });

// A false substitution claim: exchanging sides 1 and 4 of an equivariant parallelogram is NOT undone by
// reversing y_1..y_a (the sweep of issue 7 found the block to be y_(b+1)..y_(a+b)).
const claim = {
  id: 'equivariant-exchange-wrong-block',
  statement: 'Exchanging sides 1 and 4 reverses the first block of y.',
  theory: 'equivariant',
  family: { sides: ['a', 0, 'b', 'a', 0, 'b'], variables: [{ name: 'a', min: 2, max: 2 }, { name: 'b', min: 1, max: 2 }], conditions: [{ type: 'sameContent', sides: [1, 4] }] },
  transform: [{ type: 'exchange', sides: [1, 4] }],
  compare: { measure: { type: 'value' }, relation: { type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 1, to: 'a' }] } },
};

type Terms = { coefficient: string | number; exponents: number[] }[];
const norm = (t: Terms) => t.map((x) => `${x.coefficient}:${x.exponents.join(',')}`).sort();
const countTerms = (sides: readonly string[]) => {
  const r = cli('count', '--theory', 'equivariant', '--sides', sides.map((s) => s || '-').join(','), '--json');
  expect(r.status, r.stderr).toBe(0);
  return norm((JSON.parse(r.stdout) as { value: { terms: Terms } }).value.terms);
};

describe('each side shows its own value (issue 7)', () => {
  it('--json, replay, SQLite and the report give L and R as count --json does, and σ(R) apart', () => {
    writeFileSync(join(work, 'claim.json'), JSON.stringify(claim));
    const run = cli('run', 'claim.json', '--db', 's.sqlite', '--workers', '1', '--json');
    expect(run.status, run.stderr).toBe(1);
    const first = (JSON.parse(run.stdout) as { claims: { firstCounterexample: { classKey: string; index: string; left: { sides: string[]; json: { terms: Terms } }; right: { sides: string[]; json: { terms: Terms } }; substituted: { json: { terms: Terms } }; substitution: string } }[] }).claims[0]!.firstCounterexample;
    const left = countTerms(first.left.sides);
    const right = countTerms(first.right.sides);
    expect(norm(first.left.json.terms)).toEqual(left);
    expect(norm(first.right.json.terms)).toEqual(right);
    // σ = rev[1..2] on y_1..y_N: y1 ↔ y2 (hand-applied to count's terms), shown apart from R.
    const swap = (t: string) => {
      const [c, e] = t.split(':') as [string, string];
      const x = e.split(',');
      return `${c}:${[x[1], x[0], ...x.slice(2)].join(',')}`;
    };
    expect(first.substitution).toBe('rev[1..2]');
    expect(norm(first.substituted.json.terms)).toEqual(right.map(swap).sort());

    const replay = cli('replay', 'claim.json', '--db', 's.sqlite', '--instance', `${first.classKey}:${first.index}`, '--json');
    expect(replay.status).toBe(1);
    const r = JSON.parse(replay.stdout) as { left: { json: { terms: Terms } }; right: { json: { terms: Terms } }; substituted: { json: { terms: Terms } } };
    expect(norm(r.left.json.terms)).toEqual(left);
    expect(norm(r.right.json.terms)).toEqual(right);
    expect(norm(r.substituted.json.terms)).toEqual(right.map(swap).sort());

    const db = new Database(join(work, 's.sqlite'), { readonly: true });
    const row = db.prepare('SELECT left_json, right_json, right_value, substituted_value, substituted_json, substitution FROM counterexamples WHERE class_key = ? AND instance_index = ?').get(first.classKey, Number(first.index)) as Record<string, string>;
    db.close();
    expect(norm((JSON.parse(row.left_json!) as { value: { terms: Terms } }).value.terms)).toEqual(left);
    expect(norm((JSON.parse(row.right_json!) as { value: { terms: Terms } }).value.terms)).toEqual(right);
    expect(norm((JSON.parse(row.substituted_json!) as { value: { terms: Terms } }).value.terms)).toEqual(right.map(swap).sort());
    expect(row.substitution).toBe('rev[1..2]');

    const report = cli('report', 'equivariant-exchange-wrong-block', '--db', 's.sqlite', '--out', 'r.html');
    expect(report.status, report.stderr).toBe(0);
    const html = readFileSync(join(work, 'r.html'), 'utf8');
    // The report's first card shows R (the stored text, whose terms are count's) and σ(R) apart.
    const card = html.slice(html.indexOf('data-counterexample="1"'), html.indexOf('</article>'));
    const sub = (text: string) => text.replace(/y(\d+)/g, 'y<sub>$1</sub>').replace(/ - /g, ' − ');
    expect(card).toContain(`R = <span class="value">${sub(row.right_value!)}`);
    expect(card).toContain(`σ(R) = <span class="value">${sub(row.substituted_value!)}`);
    expect(html).toContain('<dt>σ(R)</dt>');
  });
});
