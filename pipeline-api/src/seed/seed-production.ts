// The demo's production: shots as the demo file lists them; real takes for some (the same solver
// thread a retarget job runs, files where a job puts them, rows as a finished job leaves them);
// the review notes; and the supervisor's decisions the notes imply.
import { resolveControls } from '@overshoot/solver';
import { Shot } from '../shots/entities/shot.entity';
import { lastShotFrame, shotClipFrames } from '../shots/shot-frames';
import { RetargetJob } from '../jobs/entities/retarget-job.entity';
import { JobState } from '../jobs/job-state';
import { runInThread } from '../jobs/solve/run-in-thread';
import { jobObjectKey, writeObject } from '../jobs/solve/object-store';
import { Take } from '../takes/entities/take.entity';
import { ReviewState, type Decision } from '../takes/review-state';
import { Note } from '../reviews/entities/note.entity';
import { ReviewDecision } from '../reviews/entities/review-decision.entity';
import { Role } from '../users/entities/role';
import type { TissueProfile } from '../library/entities/tissue-profile.entity';
import type { User } from '../users/entities/user.entity';
import { DemoDataError, type DemoShot } from './demo-show-file';
import { DEMO_JOINT_MAPS } from './demo-joint-maps';
import { dayFrom, demoItem, demoUser, type SeedContext } from './seed-context';
import { SEED_WORKER } from './seed-profile';

/** The shots, by code. */
export function seedShots(ctx: SeedContext): Map<string, Shot> {
  const shots = new Map<string, Shot>();
  for (const [i, s] of ctx.demo.shots.entries()) {
    const where = `shots[${i}]`;
    const shot = new Shot(ctx.show, s);
    shot.character = demoItem(ctx.characters, s.character, 'the character', where).row;
    const clip = demoItem(ctx.clips, s.clip, 'the clip', where).row;
    shot.clip = clip;
    // The same rule as the shot routes: the range must lie inside the clip.
    const last = clip.frameCount && clip.fps ? lastShotFrame(s, clip.frameCount, clip.fps) : null;
    if (last !== null && s.frameEnd > last) {
      throw new DemoDataError(
        `frameEnd ${s.frameEnd} is past the clip's end (frame ${last})`,
        where,
      );
    }
    shot.assignees.set(s.assignees.map((e, j) => demoUser(ctx, e, `${where}.assignees[${j}]`)));
    shot.dueDate = dayFrom(ctx.now, s.dueInDays);
    ctx.em.persist(shot);
    shots.set(shot.code, shot);
  }
  return shots;
}

/**
 * Which shots get takes, and how many: every shot of the character the profile was learned on
 * (its joints match without a map), and every shot a note names, up to the version it names.
 */
export function takePlan(ctx: SeedContext, profileCharacter: string): Map<string, number> {
  const plan = new Map<string, number>();
  for (const s of ctx.demo.shots) if (s.character === profileCharacter) plan.set(s.code, 1);
  for (const [i, n] of ctx.demo.notes.entries()) {
    if (!ctx.demo.shots.some((s) => s.code === n.shot)) {
      throw new DemoDataError(
        `names shot "${n.shot}", which the file does not define`,
        `notes[${i}]`,
      );
    }
    plan.set(n.shot, Math.max(plan.get(n.shot) ?? 1, n.takeVersion));
  }
  return plan;
}

/** Solves the planned takes of each shot with the profile; returns every take by shot code. */
export async function seedTakes(
  ctx: SeedContext,
  profile: { row: TissueProfile; bytes: Uint8Array },
  shots: Map<string, Shot>,
): Promise<Map<string, Take[]>> {
  const source = profileCharacterKey(ctx, profile.row);
  const plan = takePlan(ctx, source);
  const takes = new Map<string, Take[]>();
  for (const [code, versions] of plan) {
    const s = ctx.demo.shots.find((d) => d.code === code) as DemoShot;
    const shot = shots.get(code) as Shot;
    const character = demoItem(ctx.characters, s.character, 'the character', code);
    const clip = demoItem(ctx.clips, s.clip, 'the clip', code);
    const jointMap =
      s.character === source ? null : (DEMO_JOINT_MAPS[source]?.[s.character] ?? null);
    const submitter = submitterOf(shot);
    for (let v = 1; v <= versions; v++) {
      const controls = resolveControls({}, profile.row.modes?.length ?? 0);
      const job = new RetargetJob(shot, profile.row, { ...controls }, submitter);
      job.jointMap = jointMap;
      job.moveTo(JobState.Solving, { worker: SEED_WORKER });
      const reply = await runInThread(
        {
          kind: 'retarget',
          profile: profile.bytes,
          character: character.bytes,
          clip: clip.bytes,
          clipKind: clip.kind,
          controls,
          jointMap,
          frames: shotClipFrames(s),
          fps: s.fps,
        },
        async () => undefined,
        new AbortController().signal,
      );
      const key = jobObjectKey(ctx.show.id, job.id, 'take.glb');
      await writeObject(ctx.storage, key, reply.take, 'model/gltf-binary');
      job.moveTo(JobState.Solved);
      // As a finished job records its take (TakesService.createFromJob).
      const take = new Take(job, v, {
        controls: job.controls,
        metrics: reply.metrics,
        files: [key],
      });
      shot.reviewState = ReviewState.AwaitingReview;
      shot.latestTakeVersion = v;
      ctx.em.persist([job, take]);
      takes.set(code, [...(takes.get(code) ?? []), take]);
      ctx.log(
        `take ${code} v${v}: ${reply.take.length} bytes${jointMap ? ' (with a joint map)' : ''}`,
      );
    }
  }
  return takes;
}

/** The demo key of the character a profile was learned on. */
function profileCharacterKey(ctx: SeedContext, profile: TissueProfile): string {
  for (const [key, c] of ctx.characters) if (c.row === profile.character) return key;
  throw new Error(`profile "${profile.name}" is on a character the demo did not store`);
}

/** Who submits a shot's jobs in the demo: its first assignee (animators and artists may). */
function submitterOf(shot: Shot): User | null {
  const can = [Role.Animator, Role.TechnicalArtist, Role.Admin];
  return shot.assignees.getItems().find((u) => can.includes(u.role)) ?? null;
}

/**
 * The notes, then the decisions they imply: a take whose supervisor notes are all resolved is
 * approved; one with an open supervisor note has changes requested; the rest await review.
 */
export function seedReview(ctx: SeedContext, takes: Map<string, Take[]>): void {
  const bySupervisor = new Map<Take, { open: boolean; supervisor: User }[]>();
  for (const [i, n] of ctx.demo.notes.entries()) {
    const where = `notes[${i}]`;
    const take = takes.get(n.shot)?.find((t) => t.version === n.takeVersion);
    if (!take) throw new DemoDataError(`names take v${n.takeVersion} of ${n.shot}`, where);
    if (!take.shot.hasFrame(n.frame)) {
      throw new DemoDataError(`frame ${n.frame} is outside shot ${n.shot}`, `${where}.frame`);
    }
    const author = demoUser(ctx, n.author, `${where}.author`);
    const note = new Note(take, n.frame, n.text, null, author);
    if (n.state === 'resolved') {
      Object.assign(note, { resolved: true, resolvedBy: author, resolvedAt: ctx.now });
    }
    ctx.em.persist(note);
    if (author.role === Role.Supervisor) {
      const list = bySupervisor.get(take) ?? [];
      list.push({ open: n.state !== 'resolved', supervisor: author });
      bySupervisor.set(take, list);
    }
  }
  for (const [take, notes] of bySupervisor) {
    const open = notes.some((n) => n.open);
    const decision: Decision = open ? ReviewState.ChangesRequested : ReviewState.Approved;
    const comment = open ? 'See my notes on the frames.' : 'Approved as it is.';
    const record = new ReviewDecision(take, decision, comment, notes[0].supervisor);
    take.reviewState = decision;
    take.reviewedAt = record.at;
    if (take.shot.latestTakeVersion === take.version) take.shot.reviewState = decision;
    ctx.em.persist(record);
  }
}
