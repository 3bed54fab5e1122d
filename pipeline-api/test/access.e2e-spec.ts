import { Controller, Get, Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { Test } from '@nestjs/testing';
import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AccessGuard } from '../src/common/guards/access.guard';
import { Public } from '../src/common/decorators/public.decorator';
import { ApiExceptionFilter } from '../src/common/filters/api-exception.filter';

@Controller('probe')
class ProbeController {
  @Get('closed')
  closed() {
    return { ok: true };
  }

  @Public()
  @Get('open')
  open() {
    return { ok: true };
  }
}

@Module({
  controllers: [ProbeController],
  providers: [{ provide: APP_GUARD, useClass: AccessGuard }],
})
class ProbeModule {}

describe('access guard', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    const moduleRef = await Test.createTestingModule({ imports: [ProbeModule] }).compile();
    app = moduleRef.createNestApplication<NestExpressApplication>();
    app.useGlobalFilters(new ApiExceptionFilter());
    await app.init();
  });
  afterAll(async () => {
    await app?.close();
  });

  it('denies a route that no rule allows', async () => {
    const res = await request(app.getHttpServer()).get('/probe/closed');
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('NOT_SIGNED_IN');
  });

  it('lets a route marked public through', async () => {
    const res = await request(app.getHttpServer()).get('/probe/open');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });
});
