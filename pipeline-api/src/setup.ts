// One-off set-up run by `npm start` and `npm test` before the API starts: applies pending
// migrations and creates the first admin (printing its sign-in once).
import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/mariadb';
import { validateEnv } from './config/env.validation';
import { ormConfig } from './database/mikro-orm.config';
import { ensureFirstAdmin } from './users/users.service';

async function main(): Promise<void> {
  const env = validateEnv(process.env);
  const orm = await MikroORM.init(ormConfig(env));
  try {
    const applied = await orm.getMigrator().up();
    console.log(
      `[setup] database ${env.DB_NAME}: ${applied.length} migration(s) applied, schema up to date`,
    );
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
