import { Injectable } from '@nestjs/common';
import { DomainError } from '../common/errors/domain-error';
import { TokensService } from '../tokens/tokens.service';
import { SessionsService } from './sessions.service';
import { readCookie, SESSION_COOKIE } from './session-cookie';
import type { AuthedRequest, Principal } from './principal';

const tokenInvalid = () =>
  new DomainError('unauthenticated', 'TOKEN_INVALID', 'The pipeline token is unknown or revoked.');

/** Finds who is calling: a bearer pipeline token, else the session cookie. */
@Injectable()
export class Authenticator {
  constructor(
    private readonly sessions: SessionsService,
    private readonly tokens: TokensService,
  ) {}

  /** The principal, or null when the request carries no credentials that still work. */
  async authenticate(req: AuthedRequest): Promise<Principal | null> {
    const header = req.headers.authorization;
    if (header !== undefined) {
      // A script that sends a token wants to know it is wrong, not to be treated as anonymous.
      const match = /^Bearer\s+(\S+)\s*$/i.exec(header);
      if (!match) throw tokenInvalid();
      const token = await this.tokens.authenticate(match[1]);
      if (!token) throw tokenInvalid();
      return { kind: 'token', token, showId: token.show.id, scopes: token.scopes };
    }
    const secret = readCookie(req, SESSION_COOKIE);
    if (!secret) return null;
    const session = await this.sessions.resolve(secret);
    return session ? { kind: 'user', user: session.user, sessionId: session.id } : null;
  }
}
