// README.md against what `npm start` really does: it opens with the two commands, and the demo
// sign-ins it names are exactly the people the demo file creates (role, e-mail, password).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, stackConfig } from '../../scripts/stack/config.ts';

const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
const demo = JSON.parse(
  readFileSync(join(ROOT, 'assets-sample', 'files', 'show', 'demo-show.json'), 'utf8'),
) as { users: { role: string; email: string; demoPassword: string }[] };

/** Rows of the README's table whose second column is an e-mail address. */
function signInRows(): string[][] {
  return readme
    .split('\n')
    .filter((line) => line.startsWith('|'))
    .map((line) =>
      line
        .split('|')
        .slice(1, -1)
        .map((cell) => cell.trim()),
    )
    .filter((cells) => cells.length === 3 && /^[^@\s]+@[^@\s]+$/.test(cells[1]));
}

describe('README.md', () => {
  it('starts with the two commands, npm start and npm test', () => {
    const firstBlock = /```sh\n([\s\S]*?)```/.exec(readme)?.[1] ?? '';
    const commands = firstBlock
      .split('\n')
      .filter(Boolean)
      .map((l) => l.split('#')[0].trim());
    expect(commands).toEqual(['npm start', 'npm test']);
    // Nothing but the title comes before them.
    expect(readme.slice(0, readme.indexOf('```sh')).trim()).toBe('# Overshoot');
  });

  it('names exactly the demo sign-ins the demo file creates', () => {
    expect(signInRows()).toEqual(demo.users.map((u) => [u.role, u.email, u.demoPassword]));
  });

  it('names no other address than the default first admin of the stack settings', () => {
    const named = readme.match(/[\w.+-]+@[\w-]+(\.[\w-]+)+/g) ?? [];
    const demoEmails = demo.users.map((u) => u.email);
    const others = [...new Set(named.filter((e) => !demoEmails.includes(e)))];
    expect(others).toEqual([stackConfig('dev', {}).admin.email]);
  });
});
