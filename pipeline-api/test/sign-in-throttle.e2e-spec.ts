import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { randomIp, uniq, World } from './support/world';
import { Role } from '../src/users/entities/role';

// Low limits on this app only; the counters live in Redis, keyed by e-mail and client address,
// and every test uses its own addresses so no other test is affected.
describe('sign-in throttling', () => {
  let app: NestExpressApplication;
  let world: World;
  beforeAll(async () => {
    app = await createTestApp({
      env: { SIGN_IN_MAX_FAILURES_PER_EMAIL: 3, SIGN_IN_MAX_FAILURES_PER_IP: 4 },
    });
    world = new World(app);
  });
  afterAll(async () => {
    await app?.close();
  });

  const signIn = (email: string, password: string, ip: string) =>
    request(world.server)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-For', ip)
      .send({ email, password });

  it('answers 429 for an e-mail after its failures, even with the right password', async () => {
    const { email, password } = await world.user(Role.Animator);
    for (let i = 0; i < 3; i++)
      expect((await signIn(email, 'wrong password!', randomIp())).status).toBe(401);
    const res = await signIn(email, password, randomIp());
    expect(res.status).toBe(429);
    expect(res.body.code).toBe('SIGN_IN_THROTTLED');
    expect(res.body.details.retryAfterSeconds).toBeGreaterThan(0);
    expect(Number(res.headers['retry-after'])).toBe(res.body.details.retryAfterSeconds);
  });

  it("forgets an e-mail's failures after a successful sign-in", async () => {
    const { email, password } = await world.user(Role.Animator);
    for (let i = 0; i < 2; i++) await signIn(email, 'wrong password!', randomIp());
    expect((await signIn(email, password, randomIp())).status).toBe(200);
    for (let i = 0; i < 2; i++) await signIn(email, 'wrong password!', randomIp());
    expect((await signIn(email, password, randomIp())).status).toBe(200);
  });

  it('answers 429 for an address after its failures, whatever the e-mail', async () => {
    const ip = randomIp();
    const { email, password } = await world.user(Role.Producer);
    for (let i = 0; i < 4; i++) {
      expect((await signIn(`unknown.${uniq()}@example.test`, 'wrong password!', ip)).status).toBe(
        401,
      );
    }
    const blocked = await signIn(email, password, ip);
    expect(blocked.status).toBe(429);
    expect(blocked.body.code).toBe('SIGN_IN_THROTTLED');
    // The same person from another address is not affected.
    expect((await signIn(email, password, randomIp())).status).toBe(200);
  });
});
