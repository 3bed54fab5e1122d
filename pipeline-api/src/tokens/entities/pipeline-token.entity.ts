import { randomUUID } from 'node:crypto';
import { Entity, ManyToOne, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { User } from '../../users/entities/user.entity';
import type { TokenScope } from '../token-scope';

/** Machine access to one show for pipeline scripts; the row keeps only the secret's SHA-256. */
@Entity({ tableName: 'pipeline_tokens' })
export class PipelineToken {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  @Property({ type: 'string', length: 80 })
  name: string;

  @Property({ type: 'json' })
  scopes: TokenScope[];

  @Property({ type: 'string', length: 64, hidden: true })
  @Unique()
  tokenHash: string;

  /** The first characters of the secret, so people can tell their tokens apart. */
  @Property({ type: 'string', length: 16 })
  hint: string;

  @ManyToOne(() => User)
  createdBy: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', nullable: true })
  lastUsedAt?: Date;

  @Property({ type: 'datetime', nullable: true })
  revokedAt?: Date;

  constructor(
    show: Show,
    name: string,
    scopes: TokenScope[],
    tokenHash: string,
    hint: string,
    createdBy: User,
  ) {
    this.show = show;
    this.name = name.trim();
    this.scopes = scopes;
    this.tokenHash = tokenHash;
    this.hint = hint;
    this.createdBy = createdBy;
  }
}
