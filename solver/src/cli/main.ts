#!/usr/bin/env node
// overshoot-solve: command-line entry. Results go to stdout as JSON; errors to stderr, exit 2.
import { readFile } from 'node:fs/promises';
import { basename } from 'node:path';
import { isSolverInputError } from '../errors.js';
import { inspectFile } from '../io/inspect.js';
import { retargetCommand } from './retarget-command.js';
import { learnCommand } from './learn-command.js';
import { modesCommand } from './modes-command.js';

const USAGE = `usage: overshoot-solve <command> [options]

commands:
  inspect FILE     what a .glb or .bvh file holds (JSON on stdout), or why it is invalid
  learn            character + capture → tissue profile (learn --help for options)
  retarget         profile + character + clip → take .glb (retarget --help for options)
  modes PROFILE    the profile's modes as a JSON array
`;

const LATER = new Set<string>();

/** Runs the CLI with `args` (without node and script); resolves to the exit code. */
export async function main(args: string[]): Promise<number> {
  const [command, ...rest] = args;
  if (!command || command === '--help' || command === '-h' || command === 'help') {
    (command ? process.stdout : process.stderr).write(USAGE);
    return command ? 0 : 2;
  }
  // Retarget.
  if (command === 'retarget') return retargetCommand(rest);
  // Learn.
  if (command === 'learn') return learnCommand(rest);
  if (command === 'modes') return modesCommand(rest);
  if (LATER.has(command)) {
    process.stderr.write(`overshoot-solve: "${command}" is not yet available\n\n${USAGE}`);
    return 2;
  }
  if (command !== 'inspect') {
    process.stderr.write(`overshoot-solve: unknown command "${command}"\n\n${USAGE}`);
    return 2;
  }
  if (rest.length !== 1) {
    process.stderr.write(`overshoot-solve: inspect takes exactly one FILE\n\n${USAGE}`);
    return 2;
  }
  const file = rest[0];
  let bytes: Uint8Array;
  try {
    bytes = new Uint8Array(await readFile(file));
  } catch (e) {
    process.stderr.write(`FILE_UNREADABLE: cannot read ${file}: ${(e as Error).message}\n`);
    return 2;
  }
  try {
    const summary = await inspectFile(bytes, basename(file));
    process.stdout.write(`${JSON.stringify(summary, null, 2)}\n`);
    return 0;
  } catch (e) {
    if (isSolverInputError(e)) {
      process.stderr.write(`${e.code}: ${e.message} ${JSON.stringify(e.where)}\n`);
      return 2;
    }
    throw e;
  }
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (e: unknown) => {
    process.stderr.write(
      `INTERNAL_ERROR: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`,
    );
    process.exitCode = 1;
  },
);
