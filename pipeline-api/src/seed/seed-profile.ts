// The demo's tissue profile, really learned: the same solver thread a learn job runs in the worker
// learns from the demo capture (progress printed), its file goes where a learn job puts it, and
// the profile row gets the modes, fit report, spectra and drivers of that run.
import { LearnJob } from '../jobs/entities/learn-job.entity';
import { JobState } from '../jobs/job-state';
import { runInThread } from '../jobs/solve/run-in-thread';
import { recordLearned } from '../jobs/solve/solve-messages';
import { jobObjectKey, readObject, writeObject } from '../jobs/solve/object-store';
import { TissueProfile } from '../library/entities/tissue-profile.entity';
import type { User } from '../users/entities/user.entity';
import { DemoDataError } from './demo-show-file';
import { demoItem, type SeedContext } from './seed-context';

/** What the job rows record as the worker that ran them. */
export const SEED_WORKER = 'demo seeder';

/** Prints a stage when it changes and otherwise every ten percent. */
function progressPrinter(ctx: SeedContext, what: string) {
  let last = { stage: '', tenth: -1 };
  return async (stage: string, fraction: number) => {
    const tenth = Math.floor(fraction * 10);
    if (stage === last.stage && tenth === last.tenth) return;
    last = { stage, tenth };
    ctx.log(`${what}: ${stage} ${Math.round(fraction * 100)} %`);
  };
}

/** Learns each profile the demo names; returns them by name. */
export async function seedProfiles(
  ctx: SeedContext,
  submittedBy: User,
): Promise<Map<string, TissueProfile>> {
  const out = new Map<string, TissueProfile>();
  for (const [i, p] of ctx.demo.profilesToLearn.entries()) {
    const where = `profilesToLearn[${i}]`;
    const capture = demoItem(ctx.captures, p.capture, 'the capture', `${where}.capture`);
    const character = demoItem(ctx.characters, p.character, 'the character', `${where}.character`);
    if (capture.row.character !== character.row) {
      throw new DemoDataError('learns a capture on a character it is not registered to', where);
    }
    const profile = new TissueProfile(capture.row, character.row, p.name);
    const job = new LearnJob(profile, {}, submittedBy);
    job.moveTo(JobState.Solving, { worker: SEED_WORKER });
    const started = Date.now();
    ctx.log(`learning the tissue profile "${p.name}" from the capture…`);
    const reply = await runInThread(
      {
        kind: 'learn',
        name: p.name,
        character: character.bytes,
        capture: capture.bytes,
        settings: job.settings,
      },
      progressPrinter(ctx, 'learn'),
      new AbortController().signal,
    );
    const key = jobObjectKey(ctx.show.id, job.id, 'profile.ovsp');
    await writeObject(ctx.storage, key, reply.profile, 'application/octet-stream');
    recordLearned(profile, reply, key);
    job.moveTo(JobState.Solved);
    ctx.em.persist([profile, job]);
    out.set(p.name, profile);
    ctx.log(
      `learned "${p.name}" in ${((Date.now() - started) / 1000).toFixed(1)} s: ${reply.modes.length} modes`,
    );
  }
  return out;
}

/** The stored profile file, as a retarget job downloads it. */
export async function profileBytes(ctx: SeedContext, profile: TissueProfile): Promise<Uint8Array> {
  const key = profile.files?.[0];
  if (!key) throw new Error(`profile "${profile.name}" has no file`);
  return readObject(ctx.storage, key);
}
