// Reading a job's row straight from the database, for tests that must act at a precise moment
// of a job (kill or stop its worker mid-solve): polling the row is quicker than the API.
import type { World } from './world';
import type { LearnJob } from '../../src/jobs/entities/learn-job.entity';
import type { RetargetJob } from '../../src/jobs/entities/retarget-job.entity';

/** The solver thread's stages of a learn: a job in one of them is mid-solve. */
export const LEARN_SOLVER_STAGES = ['read', 'validate', 'poses', 'unpose', 'separate', 'subspace'];

/** Polls the job's row every 20 ms until `done(row)`; throws after a minute. */
export async function waitForRow<T extends LearnJob | RetargetJob>(
  world: World,
  entity: new (...a: never[]) => T,
  id: string,
  done: (row: T) => boolean,
): Promise<T> {
  for (let i = 0; i < 3000; i++) {
    const row = (await world.em().findOneOrFail(entity as never, id as never)) as T;
    if (done(row)) return row;
    await new Promise((r) => setTimeout(r, 20));
  }
  throw new Error(`job ${id} never reached the state wanted`);
}
