// `npm start`: every service on loopback, the database migrated, the product served.
import { stackConfig } from './stack/config.js';
import { Stack } from './stack/stack.js';
import { buildStale, generateSamples } from './stack/build.js';
import { runSetup, startApiAndWorker, type DemoReport } from './stack/api-processes.js';
import { alive } from './stack/processes.js';

const cfg = stackConfig('dev');
const stack = new Stack(cfg);
const log = (m: string) => console.log(`[start] ${m}`);

/** The sign-in lines of the closing message: the demo's people, else the first admin. */
function signInLines(demo: DemoReport | null): string[] {
  if (!demo || demo.signIns.length === 0) {
    return [
      `  Admin e-mail  ${cfg.admin.email} (its password was printed when it was created)`,
      ...(demo?.note ? [`  Demo show     not loaded: ${demo.note}`] : []),
    ];
  }
  const email = Math.max(...demo.signIns.map((s) => s.email.length));
  const password = Math.max(...demo.signIns.map((s) => s.password.length));
  return [
    '',
    `Demo sign-ins (${demo.passwordNotice ?? 'demo-only passwords'}):`,
    ...demo.signIns.map(
      (s) =>
        `  ${s.role.padEnd(17)} ${s.email.padEnd(email)}  ${s.password.padEnd(password)}  (demo only)`,
    ),
  ];
}

let stopping = false;
async function shutdown(code: number): Promise<never> {
  if (!stopping) {
    stopping = true;
    log('stopping…');
    await stack.down();
  }
  process.exit(code);
}
process.on('SIGINT', () => void shutdown(0));
process.on('SIGTERM', () => void shutdown(0));

try {
  await stack.up();
  buildStale(log);
  generateSamples(log);
  const demo = runSetup(cfg, { demo: true });
  const { url } = await startApiAndWorker(stack);
  console.log(
    [
      '',
      `Overshoot is running at ${url}`,
      `  API docs      ${url}/api/docs`,
      `  Service state ${url}/status`,
      `  Mail sink     http://${cfg.smtp.host}:${cfg.smtp.inboxPort}/messages`,
      `  Data          ${cfg.dataDir}`,
      ...signInLines(demo),
      '',
      'Press Ctrl-C to stop everything this command started.',
      '',
    ].join('\n'),
  );
  // Keep serving; if the API or worker dies, say so and stop the rest.
  setInterval(() => {
    for (const { name, pid } of stack.pids()) {
      if (!stopping && !alive(pid)) {
        log(`${name} (pid ${pid}) exited unexpectedly; see ${cfg.dataDir}/logs. Stopping.`);
        void shutdown(1);
      }
    }
  }, 2000);
} catch (e) {
  console.error(`[start] ${(e as Error).message}`);
  await shutdown(1);
}
