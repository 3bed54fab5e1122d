import { randomUUID } from 'node:crypto';
import { Entity, ManyToOne, OneToOne, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { Asset } from '../../assets/entities/asset.entity';

/** Axis-aligned bounds in metres. */
export interface BoundingBox {
  min: [number, number, number];
  max: [number, number, number];
}

/** A rigged, skinned mesh; each upload of the same name is a new version once it is ready. */
@Entity({ tableName: 'characters' })
@Unique({ properties: ['show', 'name', 'version'] })
export class Character {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  @OneToOne(() => Asset, { owner: true })
  asset: Asset;

  @Property({ type: 'string', length: 120 })
  name: string;

  /** 1, 2, … per name in the show, given when ingest accepts the file (null until then). */
  @Property({ type: 'integer', nullable: true })
  version?: number | null;

  @Property({ type: 'integer', nullable: true })
  vertexCount?: number | null;

  @Property({ type: 'integer', nullable: true })
  triangleCount?: number | null;

  /** Joint names in skeleton order. */
  @Property({ type: 'json', nullable: true })
  joints?: string[] | null;

  /** Region names (from the file's labels or derived from the dominant joints). */
  @Property({ type: 'json', nullable: true })
  regions?: string[] | null;

  @Property({ type: 'json', nullable: true })
  bbox?: BoundingBox | null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  constructor(asset: Asset, name: string) {
    this.show = asset.show;
    this.asset = asset;
    this.name = name.trim();
  }
}
