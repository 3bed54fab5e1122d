import { randomUUID } from 'node:crypto';
import { BigIntType, Entity, Enum, Index, ManyToOne, PrimaryKey, Property } from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { User } from '../../users/entities/user.entity';

/** What an uploaded file holds. */
export enum AssetKind {
  Character = 'character',
  Capture = 'capture',
  Clip = 'clip',
}

/** Where an upload is: waiting for its file or the ingest check, usable, or refused. */
export enum AssetState {
  Pending = 'pending',
  Ready = 'ready',
  Rejected = 'rejected',
}

/** Why a file was refused: a stable code, a sentence and where in the file. */
export interface ValidationReport {
  code: string;
  message: string;
  where: Record<string, unknown>;
  checkedAt: string;
}

/** Progress of the background check, as every job of the product reports it. */
export interface AssetProgress {
  stage: string;
  percent: number;
}

/** One uploaded file in the S3 store and what the ingest check found. */
@Entity({ tableName: 'assets' })
@Index({ properties: ['show', 'kind', 'state'] })
export class Asset {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  @Enum({ items: () => AssetKind })
  kind: AssetKind;

  /** Object key in the bucket; never holds the original file name (it may name a person). */
  @Property({ type: 'string', length: 255, fieldName: 's3_key' })
  s3Key: string;

  /** Size in bytes, as declared at creation and checked after the upload. */
  @Property({ type: new BigIntType('number') })
  size: number;

  /** SHA-256 of the file, lower-case hex, declared by the client and verified by ingest. */
  @Property({ type: 'string', length: 64 })
  sha256: string;

  @Property({ type: 'string', length: 100 })
  contentType: string;

  @Property({ type: 'string', length: 255 })
  originalName: string;

  @Enum({ items: () => AssetState })
  state: AssetState = AssetState.Pending;

  @Property({ type: 'json', nullable: true })
  validationReport?: ValidationReport | null;

  @Property({ type: 'json', nullable: true })
  progress?: AssetProgress | null;

  /** The open multipart upload; cleared once the file is complete. */
  @Property({ type: 'string', length: 255, nullable: true, hidden: true })
  uploadId?: string | null;

  @ManyToOne(() => User)
  uploadedBy: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  /** When the file arrived in full (multipart upload completed). */
  @Property({ type: 'datetime', nullable: true })
  uploadedAt?: Date | null;

  /** When ingest decided: ready or rejected. */
  @Property({ type: 'datetime', nullable: true })
  checkedAt?: Date | null;

  constructor(
    show: Show,
    kind: AssetKind,
    file: { size: number; sha256: string; contentType: string; originalName: string },
    uploadedBy: User,
  ) {
    this.show = show;
    this.kind = kind;
    this.size = file.size;
    this.sha256 = file.sha256.toLowerCase();
    this.contentType = file.contentType;
    this.originalName = file.originalName;
    this.uploadedBy = uploadedBy;
    const ext = /\.(glb|bvh)$/i.exec(file.originalName)?.[1]?.toLowerCase() ?? 'bin';
    this.s3Key = `shows/${show.id}/${kind}s/${this.id}.${ext}`;
  }

  /** Marks the file refused with its report. */
  reject(report: Omit<ValidationReport, 'checkedAt'>): void {
    this.state = AssetState.Rejected;
    this.checkedAt = new Date();
    this.validationReport = { ...report, checkedAt: this.checkedAt.toISOString() };
    this.progress = { stage: 'rejected', percent: 100 };
    this.uploadId = null;
  }
}
