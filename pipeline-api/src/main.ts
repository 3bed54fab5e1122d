// The HTTP API process.
import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Logger } from '@nestjs/common';
import { AppModule } from './app.module';
import { API_APP_OPTIONS, configureApp } from './configure-app';
import { Env } from './config/env.validation';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, API_APP_OPTIONS);
  configureApp(app);
  const env = app.get(Env);
  await app.listen(env.API_PORT, env.API_HOST);
  new Logger('Overshoot').log(`API listening on http://${env.API_HOST}:${env.API_PORT}`);
}

void bootstrap();
