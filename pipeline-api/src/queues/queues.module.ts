import { Module } from '@nestjs/common';
import { BullModule } from '@nestjs/bullmq';
import { Env } from '../config/env.validation';

/** BullMQ on Redis: the connection every queue and worker of this process shares. */
@Module({
  imports: [
    BullModule.forRootAsync({
      inject: [Env],
      useFactory: (env: Env) => ({
        // BullMQ needs maxRetriesPerRequest: null so that blocking commands survive reconnects.
        connection: { host: env.REDIS_HOST, port: env.REDIS_PORT, maxRetriesPerRequest: null },
        prefix: env.REDIS_PREFIX,
      }),
    }),
  ],
})
export class QueuesModule {}
