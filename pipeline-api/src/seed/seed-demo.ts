// The demo seeder run by `npm start` (setup.ts --demo): on an empty database it loads the invented
// demo show from assets-sample so every screen has something real. Safe to interrupt: files go
// to the S3 store first, under a show id fixed by the show code, and every row is written by one
// flush, one transaction, at the very end. A run cut short leaves no rows, so the database is
// still empty next time; that run first deletes the objects the cut-short one left.
import { createHash } from 'node:crypto';
import type { MikroORM } from '@mikro-orm/core';
import { verify } from '@node-rs/argon2';
import type { StorageService } from '../storage/storage.service';
import { Show } from '../shows/entities/show.entity';
import { User } from '../users/entities/user.entity';
import { Role } from '../users/entities/role';
import { DEMO_FILES_DIR, DemoDataError, readDemoShow } from './demo-show-file';
import { demoUser, type SeedContext, type SeedLog } from './seed-context';
import { firstWithRole, roleOf, seedShow, seedUsers } from './seed-people';
import { seedAssets } from './seed-assets';
import { profileBytes, seedProfiles } from './seed-profile';
import { seedReview, seedShots, seedTakes } from './seed-production';

/** Options of a seeding run. */
export interface SeedOptions {
  /** The assets-sample files folder (default: the repository's). */
  filesDir?: string;
  log?: SeedLog;
  /** The moment dates count from (default: now). */
  now?: Date;
}

/** What a run did. */
export type SeedOutcome =
  | { seeded: true; showId: string; counts: Record<string, number>; seconds: number }
  | { seeded: false; reason: string };

/** A demo sign-in that works on this database. */
export interface DemoSignIn {
  role: string;
  email: string;
  displayName: string;
  password: string;
}

/** A UUID derived from the show code (version 5 layout), so a rerun finds what a cut run left. */
export function demoShowId(code: string): string {
  const h = createHash('sha1').update(`overshoot demo show:${code}`).digest().subarray(0, 16);
  h[6] = (h[6] & 0x0f) | 0x50;
  h[8] = (h[8] & 0x3f) | 0x80;
  const x = h.toString('hex');
  return `${x.slice(0, 8)}-${x.slice(8, 12)}-${x.slice(12, 16)}-${x.slice(16, 20)}-${x.slice(20)}`;
}

/** Why the database does not count as empty, or null when it does (no user, no show). */
async function notEmpty(orm: MikroORM): Promise<string | null> {
  const em = orm.em.fork();
  const users = await em.count(User, {});
  const shows = await em.count(Show, {});
  if (users === 0 && shows === 0) return null;
  return `the database already holds ${users} user(s) and ${shows} show(s)`;
}

/** Deletes every object under a prefix (listed a thousand at a time); returns how many. */
async function clearPrefix(storage: StorageService, prefix: string): Promise<number> {
  let removed = 0;
  for (let round = 0; round < 1000; round++) {
    const keys = await storage.list(prefix);
    if (keys.length === 0) return removed;
    for (const key of keys) await storage.delete(key);
    removed += keys.length;
  }
  throw new Error(`the S3 store still lists files under ${prefix} after deleting them`);
}

/** Loads the demo show when the database is empty; otherwise does nothing and says why. */
export async function seedDemo(
  orm: MikroORM,
  storage: StorageService,
  options: SeedOptions = {},
): Promise<SeedOutcome> {
  const started = Date.now();
  const log = options.log ?? (() => undefined);
  const reason = await notEmpty(orm);
  if (reason) return { seeded: false, reason };
  const filesDir = options.filesDir ?? DEMO_FILES_DIR;
  const demo = readDemoShow(filesDir);
  const showId = demoShowId(demo.show.code);
  const leftovers = await clearPrefix(storage, `shows/${showId}/`);
  if (leftovers > 0) log(`removed ${leftovers} file(s) an interrupted earlier run left`);
  const em = orm.em.fork();
  const ctx: SeedContext = {
    em,
    storage,
    demo,
    filesDir,
    log,
    now: options.now ?? new Date(),
    show: new Show(demo.show.code, demo.show.name),
    users: new Map(),
    characters: new Map(),
    clips: new Map(),
    captures: new Map(),
  };
  log(`loading the demo show ${demo.show.code} "${demo.show.name}"…`);
  await seedUsers(ctx);
  seedShow(ctx, showId);
  const artist = demoUser(ctx, firstWithRole(demo.users, Role.TechnicalArtist).email, 'users');
  await seedAssets(ctx, artist);
  const profiles = await seedProfiles(ctx, artist);
  const [profile] = profiles.values();
  if (!profile) throw new DemoDataError('names no profile to learn', 'profilesToLearn');
  const shots = seedShots(ctx);
  const takes = await seedTakes(
    ctx,
    { row: profile, bytes: await profileBytes(ctx, profile) },
    shots,
  );
  seedReview(ctx, takes);
  // The only write to the database: every row in one transaction.
  await em.flush();
  const all = [...takes.values()].flat();
  const counts = {
    users: ctx.users.size,
    characters: ctx.characters.size,
    clips: ctx.clips.size,
    captures: ctx.captures.size,
    profiles: profiles.size,
    shots: shots.size,
    takes: all.length,
    notes: demo.notes.length,
    decisions: all.filter((t) => t.reviewedAt).length,
    files: (await storage.list(`shows/${showId}/`)).length,
  };
  return { seeded: true, showId, counts, seconds: (Date.now() - started) / 1000 };
}

/**
 * The demo sign-ins that work here: each demo user who exists, is enabled and still has the demo
 * password (a changed password is not printed). Empty when the demo was never loaded.
 */
export async function demoSignIns(orm: MikroORM, filesDir = DEMO_FILES_DIR): Promise<DemoSignIn[]> {
  const demo = readDemoShow(filesDir);
  const em = orm.em.fork();
  const out: DemoSignIn[] = [];
  for (const [i, u] of demo.users.entries()) {
    const user = await em.findOne(User, { email: User.normaliseEmail(u.email) });
    if (!user || user.disabledAt || !(await verify(user.passwordHash, u.demoPassword))) continue;
    roleOf(u.role, `users[${i}]`);
    out.push({
      role: u.role,
      email: user.email,
      displayName: user.displayName,
      password: u.demoPassword,
    });
  }
  return out;
}
