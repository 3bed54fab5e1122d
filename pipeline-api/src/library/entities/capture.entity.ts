import { randomUUID } from 'node:crypto';
import { Entity, ManyToOne, OneToOne, PrimaryKey, Property } from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { User } from '../../users/entities/user.entity';
import { Asset } from '../../assets/entities/asset.entity';
import { Character } from './character.entity';

/** The performer's consent as recorded at upload. */
export interface ConsentInput {
  /** A reference code the studio's records resolve to a person; never a name. */
  performerCode: string;
  /** What the performer agreed to. */
  scope: string;
  /** Last day the consent holds, `YYYY-MM-DD`. */
  expiresOn: string;
}

/**
 * A performer's mesh sequence registered to a character: biometric data. It carries the consent
 * record, and deleting it removes its files and keeps only the record of the deletion.
 */
@Entity({ tableName: 'captures' })
export class Capture {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  @OneToOne(() => Asset, { owner: true })
  asset: Asset;

  /** The character whose topology the capture is registered to. */
  @ManyToOne(() => Character)
  character: Character;

  @Property({ type: 'integer', nullable: true })
  frameCount?: number | null;

  @Property({ type: 'double', runtimeType: 'number', nullable: true })
  fps?: number | null;

  @Property({ type: 'string', length: 40 })
  performerCode: string;

  @Property({ type: 'string', length: 500 })
  consentScope: string;

  @Property({ type: 'date' })
  consentExpiresOn: string;

  @ManyToOne(() => User)
  consentRecordedBy: User;

  @Property({ type: 'datetime' })
  consentRecordedAt: Date = new Date();

  @Property({ type: 'datetime', nullable: true })
  deletedAt?: Date | null;

  @Property({ type: 'string', length: 500, nullable: true })
  deletionReason?: string | null;

  @ManyToOne(() => User, { nullable: true })
  deletedBy?: User | null;

  constructor(asset: Asset, character: Character, consent: ConsentInput, recordedBy: User) {
    this.show = asset.show;
    this.asset = asset;
    this.character = character;
    this.performerCode = consent.performerCode.trim();
    this.consentScope = consent.scope.trim();
    this.consentExpiresOn = consent.expiresOn;
    this.consentRecordedBy = recordedBy;
  }

  /** True when the consent's last day is before `today` (`YYYY-MM-DD`). */
  consentExpired(today: string): boolean {
    return this.consentExpiresOn < today;
  }
}
