import { randomUUID } from 'node:crypto';
import { Entity, Enum, ManyToOne, OneToOne, PrimaryKey, Property } from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { Asset } from '../../assets/entities/asset.entity';

/** A clip's file format. */
export enum ClipFormat {
  Bvh = 'bvh',
  Glb = 'glb',
}

/** Skeletal motion for a character. */
@Entity({ tableName: 'clips' })
export class Clip {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  @OneToOne(() => Asset, { owner: true })
  asset: Asset;

  @Property({ type: 'string', length: 120 })
  name: string;

  @Enum({ items: () => ClipFormat })
  format: ClipFormat;

  @Property({ type: 'double', runtimeType: 'number', nullable: true })
  fps?: number | null;

  @Property({ type: 'integer', nullable: true })
  frameCount?: number | null;

  @Property({ type: 'json', nullable: true })
  joints?: string[] | null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  constructor(asset: Asset, name: string, format: ClipFormat) {
    this.show = asset.show;
    this.asset = asset;
    this.name = name.trim();
    this.format = format;
  }
}
