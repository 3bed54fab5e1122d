// The demo step of the one-off set-up (`setup.js --demo`, run by `npm start`): load the demo show
// into an empty database, then tell the caller which demo sign-ins work here, so that `npm start`
// can print them at the end of every start.
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import type { MikroORM } from '@mikro-orm/core';
import type { Env } from '../config/env.validation';
import { StorageService } from '../storage/storage.service';
import { demoSignIns, seedDemo, type DemoSignIn } from './seed-demo';

const PASSWORD_NOTICE =
  'DEMO-ONLY passwords from assets-sample/files/show/demo-show.json: for a local demo, never for real accounts';

/** What `npm start` reads back (the `--report` file). */
export interface DemoReport {
  /** loaded: by this run; present: earlier; absent: the database held other data first. */
  demo: 'loaded' | 'present' | 'absent';
  /** Why the demo was not loaded now, when it was not. */
  note: string | null;
  /** The demo-only passwords that work on this database, one per demo user. */
  signIns: DemoSignIn[];
  /** The notice the demo file carries about those passwords. */
  passwordNotice: string | null;
}

/** Seeds when the database is empty, then reports; `log` prints progress lines. */
export async function runDemoSetup(
  orm: MikroORM,
  env: Env,
  log: (m: string) => void,
  reportFile?: string,
): Promise<DemoReport> {
  const storage = new StorageService(env);
  let report: DemoReport;
  try {
    const outcome = await seedDemo(orm, storage, { log });
    if (outcome.seeded) {
      const summary = Object.entries(outcome.counts)
        .map(([what, n]) => `${what} ${n}`)
        .join(', ');
      log(`demo show loaded in ${outcome.seconds.toFixed(0)} s: ${summary}`);
    } else {
      log(`demo show not loaded now: ${outcome.reason} (it loads only into an empty database)`);
    }
    const signIns = await demoSignIns(orm);
    report = {
      demo: outcome.seeded ? 'loaded' : signIns.length > 0 ? 'present' : 'absent',
      note: outcome.seeded ? null : outcome.reason,
      signIns,
      passwordNotice: signIns.length > 0 ? PASSWORD_NOTICE : null,
    };
  } finally {
    storage.onModuleDestroy();
  }
  if (reportFile) {
    mkdirSync(dirname(reportFile), { recursive: true });
    writeFileSync(reportFile, `${JSON.stringify(report, null, 2)}\n`);
  }
  return report;
}
