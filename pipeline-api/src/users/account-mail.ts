// The texts of account e-mails. Links carry their secret in the URL fragment, which browsers
// never send to a server, so it stays out of access logs and Referer headers.
import type { MailRequest } from '../mail/mail-outbox.service';
import type { Role } from './entities/role';

const ROLE_WORDS: Record<Role, string> = {
  admin: 'admin',
  technical_artist: 'technical artist',
  animator: 'animator',
  supervisor: 'supervisor',
  producer: 'producer',
};

/** The invitation e-mail with its accept link. */
export function invitationMail(
  publicUrl: string,
  to: string,
  role: Role,
  showNames: string[],
  secret: string,
  expiresAt: Date,
): MailRequest {
  const link = `${publicUrl.replace(/\/+$/, '')}/accept-invitation#token=${secret}`;
  const shows = showNames.length ? ` on ${showNames.join(', ')}` : '';
  return {
    to,
    kind: 'invitation',
    subject: 'You are invited to Overshoot',
    text: [
      `You are invited to join Overshoot as ${ROLE_WORDS[role]}${shows}.`,
      '',
      `Choose your name and password here: ${link}`,
      '',
      `The link works once, until ${expiresAt.toUTCString()}.`,
    ].join('\n'),
  };
}

/** The password reset e-mail with its single-use link. */
export function passwordResetMail(publicUrl: string, to: string, secret: string): MailRequest {
  const link = `${publicUrl.replace(/\/+$/, '')}/reset-password#token=${secret}`;
  return {
    to,
    kind: 'password_reset',
    subject: 'Reset your Overshoot password',
    text: [
      'Someone asked to reset the password of this Overshoot account.',
      '',
      `Choose a new password here: ${link}`,
      '',
      'The link works once, within one hour. If you did not ask, ignore this message.',
    ].join('\n'),
  };
}
