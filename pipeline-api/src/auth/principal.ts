import type { Request } from 'express';
import type { User } from '../users/entities/user.entity';
import type { PipelineToken } from '../tokens/entities/pipeline-token.entity';
import type { TokenScope } from '../tokens/token-scope';

/** A person signed in through a session cookie. */
export interface UserPrincipal {
  kind: 'user';
  user: User;
  sessionId: string;
}

/** A pipeline script authenticated by a bearer token; it only ever reaches `showId`. */
export interface TokenPrincipal {
  kind: 'token';
  token: PipelineToken;
  showId: string;
  scopes: TokenScope[];
}

/** Whoever the access guard let through. */
export type Principal = UserPrincipal | TokenPrincipal;

/** A request after the access guard: the principal is set on every non-public route. */
export type AuthedRequest = Request & { principal?: Principal };

/** The caller's address as Express sees it (honours TRUST_PROXY). */
export const clientIp = (req: Request): string => req.ip ?? req.socket.remoteAddress ?? 'unknown';
