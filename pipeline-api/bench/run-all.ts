// `npm run bench -w @overshoot/pipeline-api`: shot list latency and upload throughput against the
// running test stack (`npm run test:stack`), in a show made fresh for this run. Prints figures;
// never fails on them.
import { cpus } from 'node:os';
import { randomBytes } from 'node:crypto';
import { connectTestStack } from './bench-stack';
import { seedShow } from './seed-show';
import { runShotListBench } from './shot-list.bench';
import { runUploadBench } from './upload.bench';
import { pidListeningOn } from './server-cpu';

const SHOTS = 1000;

async function signIn(apiUrl: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${apiUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: {
      'content-type': 'application/json',
      'x-forwarded-for': `10.78.${[...randomBytes(2)].join('.')}`,
    },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200) throw new Error(`sign-in answered ${res.status}: ${await res.text()}`);
  const cookie = res.headers.getSetCookie().find((c) => c.startsWith('overshoot_session='));
  if (!cookie) throw new Error('sign-in set no session cookie');
  return cookie.split(';')[0];
}

async function main(): Promise<void> {
  console.log(
    `pipeline-api benchmarks: Node ${process.version}, ${cpus().length} cores, ${cpus()[0]?.model}`,
  );
  const stack = await connectTestStack();
  try {
    const t0 = performance.now();
    const seeded = await seedShow(stack.orm, SHOTS);
    console.log(
      `seeded show ${seeded.showId} (${SHOTS} shots, bulk SQL) in ${((performance.now() - t0) / 1000).toFixed(1)} s; API ${stack.apiUrl}`,
    );
    const cookie = await signIn(stack.apiUrl, seeded.email, seeded.password);
    const base = `/api/shows/${seeded.showId}/shots`;
    const onlyShots = process.argv.includes('--shots-only');
    const pids = {
      api: pidListeningOn(Number(stack.env.API_PORT)),
      db: pidListeningOn(Number(stack.env.DB_PORT)),
    };
    await runShotListBench(
      stack.apiUrl,
      cookie,
      [
        { name: 'first page, default sort', path: base },
        {
          name: 'one assignee, late, by due date',
          path: `${base}?assigneeId=${seeded.assigneeIds[2]}&late=true&sort=dueDate:asc,code:asc`,
        },
      ],
      pids,
    );
    if (!onlyShots) await runUploadBench(stack.apiUrl, cookie, seeded.showId, seeded.characterId);
  } finally {
    await stack.orm.close();
  }
}

main().catch((e: unknown) => {
  console.error(`benchmark could not run: ${(e as Error).message}`);
  process.exitCode = 1;
});
