// `npm test`: the same set-up as `npm start` on its own data, ports, database, Redis and bucket,
// then lint and every workspace's tests (unit, integration, browser) in one Vitest run.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, serviceEnv, stackConfig } from './stack/config.js';
import { Stack } from './stack/stack.js';
import { buildStale, generateSamples } from './stack/build.js';
import { runSetup, startApiAndWorker } from './stack/api-processes.js';

const cfg = stackConfig('test');
const stack = new Stack(cfg);
const log = (m: string) => console.log(`[test] ${m}`);
const started = Date.now();

let stopping = false;
async function finish(code: number): Promise<never> {
  if (!stopping) {
    stopping = true;
    await stack.down();
  }
  log(`finished in ${((Date.now() - started) / 1000).toFixed(0)} s`);
  process.exit(code);
}
process.on('SIGINT', () => void finish(130));
process.on('SIGTERM', () => void finish(143));

/** Runs a step in the foreground with the test environment; returns its exit code. */
function step(name: string, cmd: string, args: string[], env: NodeJS.ProcessEnv): number {
  log(name);
  const r = spawnSync(cmd, args, { cwd: ROOT, stdio: 'inherit', env });
  return r.status ?? 1;
}

interface VitestJson {
  numPassedTests: number;
  numFailedTests: number;
  numPendingTests: number;
  numTodoTests: number;
}

let code: number;
try {
  await stack.up({ fresh: true });
  buildStale(log);
  generateSamples(log);
  runSetup(cfg);
  const { url } = await startApiAndWorker(stack);
  const artifacts = join(ROOT, 'test', 'artifacts');
  mkdirSync(artifacts, { recursive: true });
  const report = join(cfg.dataDir, 'vitest-report.json');
  rmSync(report, { force: true });
  const env = {
    ...process.env,
    ...serviceEnv(cfg),
    OVERSHOOT_API_URL: url,
    OVERSHOOT_TEST_DATA_DIR: cfg.dataDir,
    OVERSHOOT_ARTIFACTS_DIR: artifacts,
  };
  const lint =
    step(
      'format (prettier --check)',
      'npx',
      ['prettier', '--check', '--log-level', 'warn', '.'],
      env,
    ) || step('lint (eslint)', 'npx', ['eslint', '.'], env);
  const tests = step(
    'tests (vitest, every workspace)',
    'npx',
    ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`],
    env,
  );
  if (existsSync(report)) {
    const r = JSON.parse(readFileSync(report, 'utf8')) as VitestJson;
    const skipped = r.numPendingTests + r.numTodoTests;
    // One plain closing line that any CI can read.
    console.log(
      `\ntests: ${r.numPassedTests} passed, ${r.numFailedTests} failed${skipped ? `, ${skipped} skipped` : ''}`,
    );
  } else {
    console.log('\ntests: 0 passed, 1 failed (vitest wrote no report)');
  }
  if (lint !== 0)
    log('format or lint failed: see the lines above (`npm run format` fixes formatting)');
  code = lint === 0 && tests === 0 ? 0 : 1;
} catch (e) {
  console.error(`[test] ${(e as Error).message}`);
  code = 1;
}
await finish(code);
