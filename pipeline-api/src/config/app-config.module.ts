import { Global, Module } from '@nestjs/common';
import { Env, validateEnv } from './env.validation';

/** The validated configuration, injectable everywhere as `Env`; start-up fails on a bad value. */
@Global()
@Module({
  providers: [{ provide: Env, useFactory: () => validateEnv(process.env) }],
  exports: [Env],
})
export class AppConfigModule {}
