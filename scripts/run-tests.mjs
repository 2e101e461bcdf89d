// `npm test`: every test runner of the project in turn, then one plain line `N passed, N failed`.
// Runners: shared (pure cores), backend (API on PGlite; again on PostgreSQL when TEST_DATABASE_URL is set),
// frontend (components), and end-to-end browser tests in test/ (built app + Debian chromium).
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureChromium } from '../test/support/chromium.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
const artifacts = join(root, 'test-artifacts');
mkdirSync(artifacts, { recursive: true });
const only = process.argv
  .find((a) => a.startsWith('--only='))
  ?.slice(7)
  .split(',');

function run(command, args, options = {}) {
  const result = spawnSync(command, args, { cwd: root, stdio: 'inherit', ...options, env: { ...process.env, ...options.env } });
  return result.status ?? 1;
}

function vitest(label, cwd, extraArgs = [], env = {}) {
  const report = join(artifacts, `vitest-${label}.json`);
  rmSync(report, { force: true });
  console.log(`\n=== ${label} tests ===`);
  const status = run('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...extraArgs], {
    cwd: join(root, cwd),
    env,
  });
  if (!existsSync(report)) return { label, passed: 0, failed: 1, note: `runner exited ${status} without a report` };
  const json = JSON.parse(readFileSync(report, 'utf8'));
  const failedFiles = (json.testResults ?? []).filter((f) => f.status === 'failed' && (f.assertionResults ?? []).length === 0).length;
  return {
    label,
    passed: json.numPassedTests,
    failed: json.numFailedTests + failedFiles + (status !== 0 && json.numFailedTests === 0 && failedFiles === 0 ? 1 : 0),
  };
}

const results = [];
const want = (name) => !only || only.includes(name);

if (run('npm', ['run', 'build', '-w', 'shared']) !== 0) results.push({ label: 'build shared', passed: 0, failed: 1 });
if (want('shared')) results.push(vitest('shared', 'shared'));
if (want('backend')) results.push(vitest('backend', 'backend'));
if (want('backend') && process.env.TEST_DATABASE_URL) {
  results.push(vitest('backend-postgres', 'backend', [], { TEST_DATABASE_URL: process.env.TEST_DATABASE_URL }));
} else if (want('backend')) {
  console.log('\n(backend API tests on PostgreSQL skipped: TEST_DATABASE_URL is not set; .ci/run sets it)');
}
if (want('frontend')) results.push(vitest('frontend', 'frontend'));
if (want('e2e')) {
  const chromium = ensureChromium();
  if (!chromium.ok) {
    console.error(`\n${chromium.message}`);
    results.push({ label: 'e2e', passed: 0, failed: 1, note: 'chromium missing' });
  } else if (run('npm', ['run', 'build']) !== 0) {
    results.push({ label: 'e2e (build)', passed: 0, failed: 1 });
  } else {
    results.push(vitest('e2e', 'test', ['--config', 'vitest.config.ts'], { CHROMIUM_PATH: chromium.path }));
  }
}

console.log('\n=== summary ===');
for (const r of results) console.log(`${r.label}: ${r.passed} passed, ${r.failed} failed${r.note ? ` (${r.note})` : ''}`);
const passed = results.reduce((s, r) => s + r.passed, 0);
const failed = results.reduce((s, r) => s + r.failed, 0);
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
