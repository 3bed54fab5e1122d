// The worker process: runs the queue processors, separate from the API so solves never block it.
// Start more of these, on more machines, against the same Redis, S3 and MariaDB to scale out.
import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { Logger } from '@nestjs/common';
import { WorkerModule } from './worker.module';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.createApplicationContext(WorkerModule);
  // SIGTERM/SIGINT close the workers after their current jobs (graceful shutdown).
  app.enableShutdownHooks();
  new Logger('Overshoot').log(`worker ${process.pid} processing queues`);
}

void bootstrap();
