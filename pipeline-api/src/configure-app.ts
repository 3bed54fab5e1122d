import { existsSync } from 'node:fs';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import helmet from 'helmet';
import { Env } from './config/env.validation';
import { ApiExceptionFilter } from './common/filters/api-exception.filter';
import { createValidationPipe } from './common/validation';
import { serveWebClient } from './web/web-client';
import { jsonBody } from './common/middleware/json-body';

/** Options for creating the app: our own JSON parser answers unreadable bodies (see jsonBody). */
export const API_APP_OPTIONS = { bodyParser: false } as const;

/** Express's `trust proxy` from its text form: true/false, a hop count, or address names. */
function trustProxy(value: string): boolean | number | string {
  if (value === 'true' || value === 'false') return value === 'true';
  return /^\d+$/.test(value) ? Number(value) : value;
}

/** HTTP set-up shared by the server and the tests: prefix, security headers, pipes, filter, docs, web client. */
export function configureApp(app: NestExpressApplication): void {
  const env = app.get(Env);
  app.setGlobalPrefix('api');
  app.set('trust proxy', trustProxy(env.TRUST_PROXY));
  app.use(...jsonBody());
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'connect-src': ["'self'", env.S3_ENDPOINT],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'worker-src': ["'self'", 'blob:'],
          // Served over plain http on loopback in development; TLS is the proxy's job in production.
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new ApiExceptionFilter());
  app.enableShutdownHooks();

  const docs = new DocumentBuilder()
    .setTitle('Overshoot pipeline API')
    .setDescription(
      'Shows, assets, solves, takes, review and tracking for the Overshoot studio pipeline.',
    )
    .setVersion('0.1.0')
    .addCookieAuth('overshoot_session', { type: 'apiKey', in: 'cookie', name: 'overshoot_session' })
    .addBearerAuth({ type: 'http', scheme: 'bearer', description: 'A pipeline token (ovs_…)' })
    .build();
  SwaggerModule.setup('api/docs', app, () => SwaggerModule.createDocument(app, docs), {
    jsonDocumentUrl: 'api/docs/openapi.json',
  });

  if (env.WEB_DIST_DIR && existsSync(env.WEB_DIST_DIR)) {
    app.use(serveWebClient(env.WEB_DIST_DIR));
  }
}
