// Following learn and retarget jobs through the API the way a client does: poll until the job
// reaches the state wanted, or fail with what it said last.
import request from 'supertest';
import type { World } from './world';
import type { JobView } from '../../src/jobs/job-view';

/** Auth of a request: a session cookie or a bearer token. */
export type Auth = { cookie: string } | { token: string };

/** Sets the auth header on a supertest request. */
export function authed(req: request.Test, auth: Auth): request.Test {
  return 'cookie' in auth
    ? req.set('Cookie', auth.cookie)
    : req.set('Authorization', `Bearer ${auth.token}`);
}

/** GET a job. */
export async function getJob(world: World, auth: Auth, showId: string, jobId: string) {
  const res = await authed(request(world.server).get(`/api/shows/${showId}/jobs/${jobId}`), auth);
  if (res.status !== 200)
    throw new Error(`GET job ${jobId}: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as JobView;
}

/** Polls a job until `done(view)`; throws after `timeoutMs` with the last view. */
export async function waitForJob(
  world: World,
  auth: Auth,
  showId: string,
  jobId: string,
  done: (job: JobView) => boolean = (j) => ['solved', 'failed', 'canceled'].includes(j.state),
  timeoutMs = 120_000,
): Promise<JobView> {
  const until = Date.now() + timeoutMs;
  let faults = 0;
  for (;;) {
    let job: JobView;
    try {
      job = await getJob(world, auth, showId, jobId);
      faults = 0;
    } catch (e) {
      // A loaded machine can make one poll time out on the database; a client polls again.
      if (++faults > 3 || !/: 5\d\d /.test((e as Error).message)) throw e;
      await new Promise((r) => setTimeout(r, 500));
      continue;
    }
    if (done(job)) return job;
    if (Date.now() > until)
      throw new Error(`job ${jobId} not there in time: ${JSON.stringify(job)}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}
