import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { DomainError } from '../common/errors/domain-error';
import { hashSecret, newSecret } from '../common/crypto/secret-token';
import { AuditService } from '../audit/audit.service';
import type { UserPrincipal } from '../auth/principal';
import { Show } from '../shows/entities/show.entity';
import { showNotFound } from '../shows/show-access.service';
import { PipelineToken } from './entities/pipeline-token.entity';
import type { TokenScope } from './token-scope';

/** Every secret starts with this, so leaked tokens are easy to spot in logs and scanners. */
export const TOKEN_PREFIX = 'ovs_';

/** Only write "last used" this often, not on every request. */
const TOUCH_EVERY_MS = 60_000;

/** A token as the API lists it (never its secret). */
export interface TokenView {
  id: string;
  showId: string;
  name: string;
  scopes: TokenScope[];
  hint: string;
  createdAt: string;
  createdBy: string;
  lastUsedAt: string | null;
  revokedAt: string | null;
}

const view = (t: PipelineToken): TokenView => ({
  id: t.id,
  showId: t.show.id,
  name: t.name,
  scopes: t.scopes,
  hint: t.hint,
  createdAt: t.createdAt.toISOString(),
  createdBy: t.createdBy.id,
  lastUsedAt: t.lastUsedAt?.toISOString() ?? null,
  revokedAt: t.revokedAt?.toISOString() ?? null,
});

/** Pipeline tokens: created per show by admins, shown once, stored hashed, revocable. */
@Injectable()
export class TokensService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  /** Creates a token; the returned `secret` is shown this once and never again. */
  async create(
    actor: UserPrincipal,
    showId: string,
    name: string,
    scopes: TokenScope[],
    ip: string,
  ): Promise<TokenView & { secret: string }> {
    const show = await this.em.findOne(Show, { id: showId });
    if (!show) throw showNotFound(showId);
    const secret = newSecret(TOKEN_PREFIX);
    const unique = [...new Set(scopes)].sort();
    const token = new PipelineToken(
      show,
      name,
      unique,
      hashSecret(secret),
      secret.slice(0, 10),
      actor.user,
    );
    this.em.persist(token);
    this.audit.add(this.em, actor, {
      action: 'token.created',
      objectType: 'pipeline_token',
      objectId: token.id,
      showId,
      details: { name: token.name, scopes: unique },
      ip,
    });
    await this.em.flush();
    return { ...view(token), secret };
  }

  /** The show's tokens, newest first, revoked ones included. */
  async list(showId: string): Promise<TokenView[]> {
    const tokens = await this.em.find(
      PipelineToken,
      { show: showId },
      { orderBy: { createdAt: 'desc' } },
    );
    return tokens.map(view);
  }

  /** Revokes a token of the show (again is harmless). */
  async revoke(actor: UserPrincipal, showId: string, tokenId: string, ip: string): Promise<void> {
    const token = await this.em.findOne(PipelineToken, { id: tokenId, show: showId });
    if (!token)
      throw new DomainError(
        'not_found',
        'TOKEN_NOT_FOUND',
        `No pipeline token ${tokenId} in show ${showId}.`,
        { tokenId },
      );
    if (token.revokedAt) return;
    token.revokedAt = new Date();
    this.audit.add(this.em, actor, {
      action: 'token.revoked',
      objectType: 'pipeline_token',
      objectId: token.id,
      showId,
      details: { name: token.name },
      ip,
    });
    await this.em.flush();
  }

  /** The live token for a bearer secret, or null; records when it was last used. */
  async authenticate(secret: string): Promise<PipelineToken | null> {
    if (!secret.startsWith(TOKEN_PREFIX)) return null;
    const token = await this.em.findOne(
      PipelineToken,
      { tokenHash: hashSecret(secret), revokedAt: null },
      { populate: ['show'] },
    );
    if (!token) return null;
    const now = new Date();
    if (!token.lastUsedAt || now.getTime() - token.lastUsedAt.getTime() > TOUCH_EVERY_MS) {
      await this.em.nativeUpdate(PipelineToken, { id: token.id }, { lastUsedAt: now });
      token.lastUsedAt = now;
    }
    return token;
  }
}
