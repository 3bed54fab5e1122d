import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { MariaDbDriver } from '@mikro-orm/mariadb';
import { Env } from '../config/env.validation';
import { ormConfig } from './mikro-orm.config';

/** The ORM on MariaDB, one EntityManager fork per request. */
@Module({
  imports: [
    MikroOrmModule.forRootAsync({
      driver: MariaDbDriver,
      inject: [Env],
      useFactory: (env: Env) => ormConfig(env),
    }),
  ],
})
export class DatabaseModule {}
