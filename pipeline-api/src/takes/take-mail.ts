// Who hears about a take, and what they are told: the shot's assignees and the person whose job
// made the take, each once, disabled accounts left out.
import type { EntityManager } from '@mikro-orm/core';
import type { Env } from '../config/env.validation';
import type { MailOutboxService } from '../mail/mail-outbox.service';
import type { User } from '../users/entities/user.entity';
import { Take } from './entities/take.entity';

/** The people concerned by a take (shot assignees and the take's creator), each once. */
export async function takeRecipients(em: EntityManager, take: Take): Promise<User[]> {
  await em.populate(take, ['shot.assignees', 'createdBy', 'shot.show'], { refresh: true });
  const people = [...take.shot.assignees.getItems(), ...(take.createdBy ? [take.createdBy] : [])];
  const byEmail = new Map(people.filter((u) => !u.disabledAt).map((u) => [u.email, u]));
  return [...byEmail.values()];
}

/** `SHOW SQ010_0040 v3`, the take's name in subjects. */
export const takeLabel = (take: Take): string =>
  `${take.shot.show.code} ${take.shot.code} v${take.version}`;

/** The web client's link to a take. */
export const takeLink = (env: Env, take: Take): string =>
  `${env.PUBLIC_URL}/shows/${take.shot.show.id}/takes/${take.id}`;

/** Sends one message per recipient through the outbox. */
export async function mailTakeRecipients(
  em: EntityManager,
  outbox: MailOutboxService,
  take: Take,
  mail: { kind: string; subject: string; text: (u: User) => string },
): Promise<number> {
  // The take may come from another unit of work (a worker's job): read it afresh here.
  const loaded = await em.findOneOrFail(Take, take.id);
  const recipients = await takeRecipients(em, loaded);
  for (const user of recipients) {
    await outbox.send(em, {
      to: user.email,
      subject: mail.subject,
      text: mail.text(user),
      kind: mail.kind,
    });
  }
  return recipients.length;
}
