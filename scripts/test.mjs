// The one test command: format, lint, types, unit + API tests, web export, browser tests.
// Prints a closing line "N passed, N failed" so CI records the count.
import { execSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';

const results = { passed: 0, failed: 0 };
const failures = [];

function run(label, command, args, env = {}) {
  console.log(`\n▶ ${label}`);
  const child = spawnSync(command, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  if (child.status !== 0) failures.push(label);
  return child.status === 0;
}

function countVitest(file) {
  if (!existsSync(file)) return;
  const report = JSON.parse(readFileSync(file, 'utf8'));
  results.passed += report.numPassedTests ?? 0;
  results.failed += report.numFailedTests ?? 0;
}

function ensureChromium() {
  const found = spawnSync('sh', ['-c', 'command -v chromium'], { encoding: 'utf8' }).stdout.trim();
  if (found) return found;
  if (process.getuid?.() !== 0) throw new Error('Debian chromium is missing and this user cannot install it');
  console.log('\n▶ installing Debian chromium for the browser tests');
  execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', {
    stdio: 'inherit',
  });
  return spawnSync('sh', ['-c', 'command -v chromium'], { encoding: 'utf8' }).stdout.trim();
}

mkdirSync('test-results', { recursive: true });
run('format (prettier --check)', 'npx', ['prettier', '--check', '.', '--log-level', 'warn']);
run('lint (eslint)', 'npx', ['eslint', '.']);
run('types (tsc --noEmit)', 'npx', ['tsc', '--noEmit']);
run('unit and API tests (vitest)', 'npx', [
  'vitest',
  'run',
  '--config',
  'vitest.config.mts',
  '--reporter=default',
  '--reporter=json',
  '--outputFile.json=test-results/unit.json',
]);
countVitest('test-results/unit.json');

if (
  run('web export (expo export)', 'npx', ['expo', 'export', '--platform', 'web', '--output-dir', 'dist'], {
    CI: '1',
  }) &&
  run('service worker (workbox generateSW)', 'node', ['scripts/build-service-worker.mjs', 'dist'])
) {
  const chromium = ensureChromium();
  run(
    'browser tests (playwright-core + Debian chromium)',
    'npx',
    [
      'vitest',
      'run',
      '--config',
      'vitest.e2e.config.mts',
      '--reporter=default',
      '--reporter=json',
      '--outputFile.json=test-results/e2e.json',
    ],
    { CHROMIUM_PATH: chromium },
  );
  countVitest('test-results/e2e.json');
}

if (failures.length) console.log(`\nFailed steps: ${failures.join('; ')}`);
console.log(`\n${results.passed} passed, ${results.failed} failed`);
process.exit(failures.length ? 1 : 0);
