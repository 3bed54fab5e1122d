// What every step of the demo seeder shares: one EntityManager whose single flush writes the
// whole demo in one transaction, the S3 store, the demo file and the rows made so far.
import type { EntityManager } from '@mikro-orm/core';
import type { StorageService } from '../storage/storage.service';
import type { Show } from '../shows/entities/show.entity';
import type { User } from '../users/entities/user.entity';
import type { Character } from '../library/entities/character.entity';
import type { Clip } from '../library/entities/clip.entity';
import type { Capture } from '../library/entities/capture.entity';
import { DemoDataError, type DemoShow } from './demo-show-file';

/** A progress line for the person running `npm start`. */
export type SeedLog = (message: string) => void;

/** The seeder's working state. */
export interface SeedContext {
  em: EntityManager;
  storage: StorageService;
  demo: DemoShow;
  filesDir: string;
  log: SeedLog;
  /** The moment of seeding; due dates and consent expiry count from its day. */
  now: Date;
  show: Show;
  /** By e-mail. */
  users: Map<string, User>;
  /** By the demo file's keys, with the file bytes the solver needs later. */
  characters: Map<string, { row: Character; bytes: Uint8Array }>;
  clips: Map<string, { row: Clip; bytes: Uint8Array; kind: 'bvh' | 'gltf' }>;
  captures: Map<string, { row: Capture; bytes: Uint8Array }>;
}

/** The demo user with this e-mail, or a DemoDataError naming `where`. */
export function demoUser(ctx: SeedContext, email: string, where: string): User {
  const user = ctx.users.get(email.trim().toLowerCase());
  if (!user) throw new DemoDataError(`names "${email}", who is not among the users`, where);
  return user;
}

/** A Map lookup that fails with a DemoDataError naming `where`. */
export function demoItem<T>(map: Map<string, T>, key: string, what: string, where: string): T {
  const item = map.get(key);
  if (!item)
    throw new DemoDataError(`names ${what} "${key}", which the file does not define`, where);
  return item;
}

/** `YYYY-MM-DD` of the seeding day moved by `days`. */
export function dayFrom(now: Date, days: number): string {
  return new Date(now.getTime() + days * 86_400_000).toISOString().slice(0, 10);
}
