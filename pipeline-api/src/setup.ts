// One-off set-up run by `npm start` and `npm test` before the API starts: applies pending
// migrations, loads the demo show into an empty database when asked (`--demo`, by `npm start`;
// `--report FILE` writes which demo sign-ins work), and creates the first admin when there is no
// admin yet (printing its sign-in once).
import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/mariadb';
import { validateEnv } from './config/env.validation';
import { ormConfig } from './database/mikro-orm.config';
import { ensureFirstAdmin } from './users/users.service';
import { runDemoSetup } from './seed/demo-setup';

/** The value after a command-line flag, if given. */
const flagValue = (flag: string): string | undefined => {
  const i = process.argv.indexOf(flag);
  return i >= 0 ? process.argv[i + 1] : undefined;
};

async function main(): Promise<void> {
  const env = validateEnv(process.env);
  const orm = await MikroORM.init(ormConfig(env));
  try {
    const applied = await orm.getMigrator().up();
    console.log(
      `[setup] database ${env.DB_NAME}: ${applied.length} migration(s) applied, schema up to date`,
    );
    if (process.argv.includes('--demo')) {
      // Before the first admin: the demo brings its own, and loads only into an empty database.
      await runDemoSetup(orm, env, (m) => console.log(`[setup] ${m}`), flagValue('--report'));
    }
    const admin = await ensureFirstAdmin(orm.em.fork(), env.ADMIN_EMAIL, env.ADMIN_PASSWORD);
    if (admin) {
      console.log(
        `[setup] first admin created — sign in as ${admin.user.email} with password: ${admin.password}`,
      );
      console.log('[setup] this password is printed only once; keep it somewhere safe.');
    }
  } finally {
    await orm.close();
  }
}

main().catch((e: Error) => {
  console.error(`[setup] failed: ${e.message}`);
  process.exit(1);
});
