// Builds each workspace whose sources are newer than its last build, in dependency order.
import { existsSync, readdirSync, statSync, writeFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT } from './config.js';
import { run } from './processes.js';

/** Workspaces with a build, in the order they depend on each other. */
const BUILDS = [
  { workspace: 'solver', inputs: ['src', 'package.json', 'tsconfig.json', 'tsconfig.build.json'] },
  {
    workspace: 'pipeline-api',
    inputs: ['src', 'package.json', 'tsconfig.json', 'tsconfig.build.json'],
  },
  {
    workspace: 'studio-web',
    inputs: ['src', 'public', 'index.html', 'package.json', 'tsconfig.json', 'vite.config.ts'],
  },
];

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const name of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, name)));
  return newest;
}

/** Runs `npm run build` in each stale workspace; returns the names it built. */
export function buildStale(log: (m: string) => void): string[] {
  const built: string[] = [];
  const lockTime = newestMtime(join(ROOT, 'package-lock.json'));
  let upstreamRebuilt = false;
  for (const { workspace, inputs } of BUILDS) {
    const dir = join(ROOT, workspace);
    const stamp = join(dir, 'dist', '.build-stamp');
    const sourceTime = Math.max(lockTime, ...inputs.map((i) => newestMtime(join(dir, i))));
    if (!upstreamRebuilt && existsSync(stamp) && statSync(stamp).mtimeMs >= sourceTime) continue;
    log(`building ${workspace}…`);
    run('npm', ['run', 'build', '-w', workspace], { cwd: ROOT });
    mkdirSync(join(dir, 'dist'), { recursive: true });
    writeFileSync(stamp, new Date().toISOString());
    built.push(workspace);
    upstreamRebuilt = true;
  }
  return built;
}

/** Generates the invented demo and test assets when their generator or the solver changed. */
export function generateSamples(log: (m: string) => void): void {
  log('checking the sample assets…');
  const out = run('npm', ['run', '--silent', 'generate', '-w', 'assets-sample'], { cwd: ROOT });
  const last = out.trim().split('\n').pop();
  if (last) log(last);
}
