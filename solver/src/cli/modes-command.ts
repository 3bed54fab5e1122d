// `overshoot-solve modes PROFILE`: the profile's modes as a JSON array on stdout.
import { readFile } from 'node:fs/promises';
import { isSolverInputError } from '../errors.js';
import { readProfile } from '../io/profile-format.js';

/** Usage of the modes command. */
export const MODES_USAGE = 'usage: overshoot-solve modes PROFILE\n';

/** Runs `modes` with its arguments; resolves to the exit code. */
export async function modesCommand(args: string[]): Promise<number> {
  if (args.includes('--help') || args.includes('-h')) {
    process.stdout.write(MODES_USAGE);
    return 0;
  }
  if (args.length !== 1) {
    process.stderr.write(`BAD_ARGUMENTS: modes takes exactly one PROFILE\n\n${MODES_USAGE}`);
    return 2;
  }
  let bytes: Uint8Array;
  try {
    bytes = new Uint8Array(await readFile(args[0]));
  } catch (e) {
    process.stderr.write(`FILE_UNREADABLE: cannot read ${args[0]}: ${(e as Error).message}\n`);
    return 2;
  }
  try {
    const profile = readProfile(bytes);
    const rows = profile.modes.map(({ frequencyHz, dampingRatio, region, energyShare }) => ({
      frequencyHz,
      dampingRatio,
      region,
      energyShare,
    }));
    process.stdout.write(`${JSON.stringify(rows, null, 2)}\n`);
    return 0;
  } catch (e) {
    if (isSolverInputError(e)) {
      process.stderr.write(`${e.code}: ${e.message} ${JSON.stringify(e.where)}\n`);
      return 2;
    }
    throw e;
  }
}
