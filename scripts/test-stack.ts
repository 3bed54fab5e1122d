// `npm run test:stack`: the services of `npm test` (test profile), built and migrated, with the API
// and a worker, kept up until Ctrl-C — for rerunning one project's tests while working on it:
// `npx vitest run --project pipeline-api`.
import { serviceEnv, stackConfig } from './stack/config.js';
import { Stack } from './stack/stack.js';
import { buildStale, generateSamples } from './stack/build.js';
import { runSetup, startApiAndWorker } from './stack/api-processes.js';

const cfg = stackConfig('test');
const stack = new Stack(cfg);
const log = (m: string) => console.log(`[test:stack] ${m}`);

let stopping = false;
async function shutdown(code: number): Promise<never> {
  if (!stopping) {
    stopping = true;
    await stack.down();
  }
  process.exit(code);
}
process.on('SIGINT', () => void shutdown(0));
process.on('SIGTERM', () => void shutdown(0));

try {
  await stack.up({ fresh: process.argv.includes('--fresh') });
  buildStale(log);
  generateSamples(log);
  runSetup(cfg);
  const { url } = await startApiAndWorker(stack);
  log(`test stack up: API ${url}, database ${cfg.mariadb.database} on port ${cfg.mariadb.port}`);
  log(`the worker runs the built code: after changing pipeline-api, restart this command`);
  log(
    `environment the tests use: ${Object.keys(serviceEnv(cfg)).length} variables (see scripts/stack/config.ts)`,
  );
  log('Ctrl-C stops it.');
  setInterval(() => undefined, 60_000);
} catch (e) {
  console.error(`[test:stack] ${(e as Error).message}`);
  await shutdown(1);
}
