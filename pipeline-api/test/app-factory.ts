import { Test } from '@nestjs/testing';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from '../src/app.module';
import { API_APP_OPTIONS, configureApp } from '../src/configure-app';

/** The whole API in-process, configured exactly as `main.ts` does, on the real test services. */
export async function createTestApp(): Promise<NestExpressApplication> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>(API_APP_OPTIONS);
  configureApp(app);
  await app.init();
  return app;
}
