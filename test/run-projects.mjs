// Runs the vitest projects one after another and prints each one's wall time, so `npm test` and CI show
// where the time goes. Every project runs even if an earlier one fails; the exit status is the first failure's.
// Usage: node test/run-projects.mjs unit math integration [-- extra vitest arguments]
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const args = process.argv.slice(2);
const cut = args.indexOf('--');
const projects = cut < 0 ? args : args.slice(0, cut);
const extra = cut < 0 ? [] : args.slice(cut + 1);
const vitest = fileURLToPath(new URL('../node_modules/vitest/vitest.mjs', import.meta.url));

const rows = [];
let status = 0;
for (const project of projects) {
  const start = process.hrtime.bigint();
  const r = spawnSync(process.execPath, [vitest, 'run', '--project', project, ...extra], { stdio: 'inherit' });
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const code = r.status ?? 1;
  rows.push({ project, seconds, code });
  if (code !== 0 && status === 0) status = code;
}
console.log('\nvitest projects (wall time):');
for (const { project, seconds, code } of rows) {
  console.log(`  ${project.padEnd(12)} ${seconds.toFixed(1).padStart(7)} s  ${code === 0 ? 'passed' : `FAILED (exit ${code})`}`);
}
process.exit(status);
