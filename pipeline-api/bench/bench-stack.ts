// Where the benchmarks find the test stack (`npm run test:stack`): its API, database and bucket.
// Never the data of `npm start`: the settings come from the test profile only.
import { MikroORM } from '@mikro-orm/mariadb';
import { serviceEnv, stackConfig } from '../../scripts/stack/config';

/** The test stack's settings as the API reads them. */
export interface BenchStack {
  apiUrl: string;
  env: Record<string, string>;
  orm: MikroORM;
}

/** Fails with a clear message unless the test stack's API answers on loopback. */
export async function connectTestStack(): Promise<BenchStack> {
  const env = serviceEnv(stackConfig('test'));
  const apiUrl = `http://${env.API_HOST}:${env.API_PORT}`;
  const health = await fetch(`${apiUrl}/api/health`).catch(() => null);
  if (!health || health.status !== 200) {
    throw new Error(
      `no healthy test API at ${apiUrl}: start \`npm run test:stack\` (API, worker and services) first`,
    );
  }
  // Raw SQL only: seeding in bulk needs no entity metadata, so the ORM starts without entities.
  const orm = await MikroORM.init({
    host: env.DB_HOST,
    port: Number(env.DB_PORT),
    dbName: env.DB_NAME,
    user: env.DB_USER,
    password: env.DB_PASSWORD,
    entities: [],
    discovery: { warnWhenNoEntities: false },
    debug: false,
  });
  return { apiUrl, env, orm };
}
