/**
 * `npm test`: the whole quality gate, one step after another, stopping at the first that fails, then the time
 * each step took (the table DEVELOPERS.md quotes). Each step is an npm script, runnable on its own.
 */
import { spawnSync } from 'node:child_process';
import { loadavg } from 'node:os';

const STEPS = [
  ['types', 'typecheck'],
  ['lint', 'lint'],
  ['format', 'format:check'],
  ['reference fixtures', 'test:reference'],
  ['unit and reference checks', 'test:unit'],
  ['production build', 'build'],
  ['first view size', 'check:first-view'],
  ['end-to-end', 'test:e2e'],
];

const times = [];
const started = Date.now();
let failed = null;
for (const [label, script] of STEPS) {
  console.log(`\n== ${label} (npm run ${script})`);
  const t0 = Date.now();
  const r = spawnSync('npm', ['run', '--silent', script], { stdio: 'inherit' });
  times.push([label, script, (Date.now() - t0) / 1000]);
  if (r.status !== 0) {
    failed = label;
    break;
  }
}
const total = (Date.now() - started) / 1000;
console.log(`\n${failed ? `npm test FAILED at: ${failed}` : 'npm test passed'}; seconds per step:`);
for (const [label, script, s] of times)
  console.log(`  ${label.padEnd(26)} ${s.toFixed(1).padStart(7)}  npm run ${script}`);
console.log(
  `  ${'total'.padEnd(26)} ${total.toFixed(1).padStart(7)}  (load average ${loadavg()[0].toFixed(1)})`,
);
process.exitCode = failed ? 1 : 0;
