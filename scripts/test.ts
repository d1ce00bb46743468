import fs from 'node:fs';
import path from 'node:path';
import { buildApp } from './build-app';
import { run } from './run';

// The whole suite: lint (ESLint, no warnings), type check, a production build of the app for the
// integration and browser tests, then vitest (unit, integration, browser).
const root = path.resolve(__dirname, '..');
const bin = (name: string) => path.join(root, 'node_modules', '.bin', name);

async function main() {
  const started = Date.now();
  const step = async (label: string, cmd: string, args: string[], env: Record<string, string> = {}) => {
    console.log(`\n== ${label}`);
    const code = await run(cmd, args, env);
    if (code !== 0) {
      console.error(`\n${label} failed (exit ${code})`);
      process.exit(code);
    }
  };
  await step('lint', bin('eslint'), [root, '--max-warnings', '0']);
  await step('type check', bin('tsc'), ['--noEmit', '-p', root]);
  console.log('\n== build (for the integration and browser tests)');
  const built = await buildApp(root, process.env.POURPROOF_TEST_DIST ?? '.next-test');
  if (built !== 0) {
    console.error(`\nbuild failed (exit ${built})`);
    process.exit(built);
  }
  const report = path.join(root, 'test-results', 'vitest.json');
  fs.rmSync(report, { force: true });
  console.log('\n== tests');
  const code = await run(bin('vitest'), ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...process.argv.slice(2)]);
  // One plain closing line that any CI reads: N passed, N failed.
  if (fs.existsSync(report)) {
    const r = JSON.parse(fs.readFileSync(report, 'utf8')) as { numPassedTests: number; numFailedTests: number; numPendingTests: number };
    console.log(`\ntests: ${r.numPassedTests} passed, ${r.numFailedTests} failed, ${r.numPendingTests} skipped`);
  }
  console.log(`all done in ${Math.round((Date.now() - started) / 1000)} s`);
  process.exit(code);
}

main();
