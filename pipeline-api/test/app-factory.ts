import { Test } from '@nestjs/testing';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from '../src/app.module';
import { API_APP_OPTIONS, configureApp } from '../src/configure-app';
import { Env, validateEnv } from '../src/config/env.validation';

/** Changes to the test app: settings to override, extra modules (e.g. probe routes). */
export interface TestAppOptions {
  env?: Partial<Env>;
  imports?: NonNullable<Parameters<typeof Test.createTestingModule>[0]['imports']>;
}

/** The whole API in-process, configured exactly as `main.ts` does, on the real test services. */
export async function createTestApp(options: TestAppOptions = {}): Promise<NestExpressApplication> {
  let builder = Test.createTestingModule({ imports: [AppModule, ...(options.imports ?? [])] });
  if (options.env) {
    builder = builder
      .overrideProvider(Env)
      .useValue(Object.assign(validateEnv(process.env), options.env));
  }
  const moduleRef = await builder.compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>(API_APP_OPTIONS);
  configureApp(app);
  await app.init();
  return app;
}
