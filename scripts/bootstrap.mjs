#!/usr/bin/env node
// Entry of `npm start` and `npm test`. Plain JavaScript on purpose: it runs on a fresh machine
// before any npm dependency exists, installs what is missing (Debian packages, node_modules),
// then hands over to the TypeScript orchestration in scripts/start.ts or scripts/test.ts.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const mode = process.argv[2];
const ENTRIES = { start: 'start.ts', test: 'test.ts', 'test-stack': 'test-stack.ts' };
if (!(mode in ENTRIES)) {
  console.error('usage: node scripts/bootstrap.mjs start|test|test-stack');
  process.exit(2);
}

const [major, minor] = process.versions.node.split('.').map(Number);
if (major < 20 || (major === 20 && minor < 19)) {
  console.error(`Overshoot needs Node.js 20.19 or newer; this is ${process.versions.node}.`);
  process.exit(1);
}

/** Debian packages and the binary that proves each is installed. */
const DEBIAN = [
  { pkg: 'mariadb-server', bin: 'mariadbd', dirs: ['/usr/sbin', '/usr/bin'] },
  { pkg: 'mariadb-client', bin: 'mariadb-admin', dirs: ['/usr/bin'] },
  { pkg: 'redis-server', bin: 'redis-server', dirs: ['/usr/bin'] },
  ...(mode !== 'start' ? [{ pkg: 'chromium', bin: 'chromium', dirs: ['/usr/bin'] }] : []),
];

const missing = DEBIAN.filter(({ bin, dirs }) => !dirs.some((d) => existsSync(join(d, bin))));
if (missing.length > 0) {
  const names = missing.map((m) => m.pkg);
  console.log(`[setup] installing Debian packages: ${names.join(', ')}`);
  const asRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  const apt = (args) => {
    const cmd = asRoot ? 'apt-get' : 'sudo';
    const argv = asRoot ? args : ['apt-get', ...args];
    const r = spawnSync(cmd, argv, {
      stdio: 'inherit',
      env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
    });
    return r.status === 0;
  };
  const ok = apt(['update']) && apt(['install', '-y', '--no-install-recommends', ...names]);
  if (!ok) {
    console.error(
      `[setup] could not install ${names.join(', ')}. Install them with apt-get as root, then run again.`,
    );
    process.exit(1);
  }
}

// npm ci when node_modules is missing or older than the lock file.
const lock = join(root, 'package-lock.json');
const installed = join(root, 'node_modules', '.package-lock.json');
if (!existsSync(installed) || statSync(installed).mtimeMs < statSync(lock).mtimeMs) {
  console.log('[setup] installing npm dependencies (npm ci)…');
  execFileSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
}

// Quiet a Node-version notice of the AWS SDK that says nothing actionable here.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

const { register } = await import('tsx/esm/api');
register();
const entry = join(root, 'scripts', ENTRIES[mode]);
await import(pathToFileURL(entry).href);
