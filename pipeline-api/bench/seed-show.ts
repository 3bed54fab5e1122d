// A fresh show for one benchmark run, written by bulk SQL (1,000 shots in one statement): its
// members, a ready character to attach a capture to, and shots spread over sequences, states,
// due dates and assignees like a production's table.
import { randomBytes, randomUUID } from 'node:crypto';
import type { MikroORM } from '@mikro-orm/mariadb';
import { hashPassword } from '../src/users/users.service';
import { Role } from '../src/users/entities/role';

/** What the run made. */
export interface SeededShow {
  showId: string;
  characterId: string;
  /** The technical artist the run signs in as. */
  email: string;
  password: string;
  assigneeIds: string[];
}

const RENDER = ['not_started', 'queued', 'rendering', 'rendered', 'failed'];
const SOLVE = [null, 'queued', 'solving', 'solved', 'failed', 'canceled'];
const REVIEW = [null, 'awaiting_review', 'approved', 'changes_requested'];
const ASSIGNEES = 8;
const PER_SEQUENCE = 50;

const day = (offset: number) =>
  new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);

/** Inserts rows as one multi-row statement. */
async function insert(
  orm: MikroORM,
  table: string,
  rows: Record<string, unknown>[],
): Promise<void> {
  const cols = Object.keys(rows[0]);
  const values = rows.map(() => `(${cols.map(() => '?').join(', ')})`).join(', ');
  const sql = `insert into \`${table}\` (${cols.map((c) => `\`${c}\``).join(', ')}) values ${values}`;
  await orm.em.getConnection().execute(
    sql,
    rows.flatMap((r) => cols.map((c) => r[c])),
  );
}

/** Seeds a new show with `shotCount` shots; returns what the benchmark needs. */
export async function seedShow(orm: MikroORM, shotCount: number): Promise<SeededShow> {
  const now = new Date();
  const tag = randomBytes(4).toString('hex');
  const showId = randomUUID();
  const password = `bench-${randomBytes(9).toString('base64url')}`;
  const hash = await hashPassword(password);
  await insert(orm, 'shows', [
    { id: showId, code: `B${tag}`, name: 'Benchmark show', created_at: now, updated_at: now },
  ]);
  const artist = {
    id: randomUUID(),
    email: `bench.ta.${tag}@example.test`,
    role: Role.TechnicalArtist,
  };
  const animators = Array.from({ length: ASSIGNEES }, (_, i) => ({
    id: randomUUID(),
    email: `bench.an${i}.${tag}@example.test`,
    role: Role.Animator,
  }));
  const users = [artist, ...animators];
  await insert(
    orm,
    'users',
    users.map((u, i) => ({
      id: u.id,
      email: u.email,
      display_name: `Bench user ${i}`,
      password_hash: hash,
      role: u.role,
      created_at: now,
      updated_at: now,
    })),
  );
  await insert(
    orm,
    'memberships',
    users.map((u) => ({ id: randomUUID(), show_id: showId, user_id: u.id, created_at: now })),
  );
  const characterId = await seedCharacter(orm, showId, artist.id, now);
  const shots = Array.from({ length: shotCount }, (_, i) => {
    const seq = `sq${String(10 * (1 + Math.floor(i / PER_SEQUENCE))).padStart(3, '0')}`;
    return {
      id: randomUUID(),
      show_id: showId,
      sequence: seq,
      code: `${seq}_${String(10 * (1 + (i % PER_SEQUENCE))).padStart(4, '0')}`,
      frame_start: 1001,
      frame_end: 1001 + 24 + (i % 97),
      fps: 24,
      due_date: i % 10 === 0 ? null : day((i % 121) - 60),
      render_state: RENDER[i % RENDER.length],
      solve_state: SOLVE[i % SOLVE.length],
      review_state: REVIEW[(i >> 1) % REVIEW.length],
      latest_take_version: i % 4 === 0 ? null : 1 + (i % 3),
      created_at: now,
      updated_at: now,
    };
  });
  await insert(orm, 'shots', shots);
  await insert(
    orm,
    'shot_assignees',
    shots.flatMap((s, i) => {
      const first = animators[i % ASSIGNEES].id;
      const second = animators[(i + 3) % ASSIGNEES].id;
      return (i % 3 === 0 ? [first, second] : [first]).map((u) => ({ shot_id: s.id, user_id: u }));
    }),
  );
  return {
    showId,
    characterId,
    email: artist.email,
    password,
    assigneeIds: animators.map((a) => a.id),
  };
}

/** A character marked ready (no file: the capture upload only needs its row). */
async function seedCharacter(
  orm: MikroORM,
  showId: string,
  userId: string,
  now: Date,
): Promise<string> {
  const assetId = randomUUID();
  const characterId = randomUUID();
  await insert(orm, 'assets', [
    {
      id: assetId,
      show_id: showId,
      kind: 'character',
      s3_key: `shows/${showId}/characters/${assetId}.glb`,
      size: 1,
      sha256: '0'.repeat(64),
      content_type: 'model/gltf-binary',
      original_name: 'bench_character.glb',
      state: 'ready',
      uploaded_by_id: userId,
      created_at: now,
      updated_at: now,
      uploaded_at: now,
      checked_at: now,
    },
  ]);
  await insert(orm, 'characters', [
    {
      id: characterId,
      show_id: showId,
      asset_id: assetId,
      name: 'bench_character',
      version: 1,
      created_at: now,
    },
  ]);
  return characterId;
}
