// npm test: the whole stack on a separate test database, then type check, lint, unit, integration
// and end-to-end tests. Ends with a plain "N passed, N failed" line; exits non-zero on any failure.
import { readFileSync, rmSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import { bringUpTestStack, buildApp, root, startApp } from './lib/stack.mjs';
import { run, waitForHttp } from './lib/processes.mjs';

const startedAt = Date.now();
// `npm run test:load` (--load): the same stack and build, then only the load test, which is too heavy
// for the two cores every `npm test` run shares with the database and the browser.
const LOAD_ONLY = process.argv.includes('--load');
const checks = [];
let stack;

async function check(name, command, args, env) {
  const t0 = Date.now();
  console.log(`\n── ${name} ──`);
  const code = await run(command, args, { cwd: root, env, allowFailure: true });
  checks.push({ name, ok: code === 0, seconds: (Date.now() - t0) / 1000 });
  return code === 0;
}

function vitestCounts(file) {
  try {
    const report = JSON.parse(readFileSync(file, 'utf8'));
    return { passed: report.numPassedTests ?? 0, failed: (report.numFailedTests ?? 0) + (report.numRuntimeErrorTestSuites ?? 0) };
  } catch {
    return { passed: 0, failed: 1 };
  }
}

let exitCode = 1;
try {
  let env;
  ({ stack, env } = await bringUpTestStack());

  if (!LOAD_ONLY) {
    await check('type check', process.execPath, ['node_modules/typescript/bin/tsc', '--noEmit', '-p', '.'], env);
    await check('lint', process.execPath, ['node_modules/eslint/bin/eslint.js', '.', '--max-warnings=0'], env);
  }

  await buildApp({ ...env, NODE_ENV: 'production' });
  const app = startApp(stack.group, env, stack.ports.app);
  await waitForHttp(stack.appUrl, { child: app, name: 'app' });

  const resultsDir = path.join(root, 'tmp', `test-run-${process.env.WAYGRADE_PORT_OFFSET ?? 0}`);
  rmSync(resultsDir, { recursive: true, force: true });
  mkdirSync(resultsDir, { recursive: true });
  // One project at a time: on two cores, browser tests beside CPU-heavy property tests starve both.
  const tests = { passed: 0, failed: 0 };
  for (const project of LOAD_ONLY ? ['load'] : ['unit', 'integration', 'e2e']) {
    console.log(`\n── ${project} tests ──`);
    const resultsFile = path.join(resultsDir, `vitest-${project}.json`);
    await run(
      process.execPath,
      ['node_modules/vitest/vitest.mjs', 'run', '--project', project, '--reporter=default', '--reporter=json', `--outputFile.json=${resultsFile}`],
      { cwd: root, env, allowFailure: true },
    );
    const counts = vitestCounts(resultsFile);
    tests.passed += counts.passed;
    tests.failed += counts.failed;
  }
  const checkPassed = checks.filter((c) => c.ok).length;
  const checkFailed = checks.length - checkPassed;
  for (const c of checks) console.log(`${c.ok ? 'ok  ' : 'FAIL'} ${c.name} (${c.seconds.toFixed(1)} s)`);
  console.log(`tests: ${tests.passed} passed, ${tests.failed} failed; took ${Math.round((Date.now() - startedAt) / 1000)} s`);
  const passed = tests.passed + checkPassed;
  const failed = tests.failed + checkFailed;
  exitCode = failed === 0 && passed > 0 ? 0 : 1;
  await stack.stop();
  stack = undefined;
  console.log(`${passed} passed, ${failed} failed`);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  console.log('0 passed, 1 failed');
} finally {
  if (stack) await stack.stop();
  process.exit(exitCode);
}
