// Configuration for the MikroORM CLI (`npm run migration:create -w pipeline-api`).
import { validateEnv } from '../config/env.validation';
import { ormConfig } from './mikro-orm.config';

export default ormConfig(validateEnv(process.env));
