import { randomUUID } from 'node:crypto';
import { Entity, Enum, Index, ManyToOne, PrimaryKey, Property } from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { Capture } from './capture.entity';
import { Character } from './character.entity';

/** Where a profile is: waiting to learn, learning, usable, or failed. */
export enum ProfileState {
  Queued = 'queued',
  Learning = 'learning',
  Ready = 'ready',
  Failed = 'failed',
}

/** One learned mode as the library shows it. */
export interface ProfileMode {
  frequencyHz: number;
  dampingRatio: number;
  region: string;
  energyShare: number;
  flags?: string[];
}

/** One region's power spectrum of dynamic displacement, with its peaks. */
export interface ProfileSpectrum {
  region: string;
  frequencyHz: number[];
  power: number[];
  peaks: { frequencyHz: number; power: number }[];
}

/** A joint whose motion drives the profile, and its share of the input energy. */
export interface ProfileDriver {
  joint: string;
  energyShare: number;
}

/** What the solver learned from one capture on one character (filled by the learn job). */
@Entity({ tableName: 'tissue_profiles' })
@Index({ properties: ['show', 'state'] })
export class TissueProfile {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  @ManyToOne(() => Capture)
  capture: Capture;

  @ManyToOne(() => Character)
  character: Character;

  @Property({ type: 'string', length: 120 })
  name: string;

  @Enum({ items: () => ProfileState })
  state: ProfileState = ProfileState.Queued;

  /** The profile's modes (frequency, damping ratio, region, share of energy). */
  @Property({ type: 'json', nullable: true })
  modes?: ProfileMode[] | null;

  @Property({ type: 'json', nullable: true })
  fitReport?: Record<string, unknown> | null;

  /** Per region spectra of the dynamic displacement, with peaks. */
  @Property({ type: 'json', nullable: true })
  spectra?: ProfileSpectrum[] | null;

  /** Driver joints with their share of the input (for joint maps before a retarget). */
  @Property({ type: 'json', nullable: true })
  drivers?: ProfileDriver[] | null;

  /** Joint names of the character it was learned on (what a joint map may name). */
  @Property({ type: 'json', nullable: true })
  sourceJoints?: string[] | null;

  /** Object keys of the profile's files in the bucket. */
  @Property({ type: 'json', nullable: true })
  files?: string[] | null;

  /** Set when the capture it was learned from is deleted: the profile says so. */
  @Property({ type: 'datetime', nullable: true })
  captureDeletedAt?: Date | null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  constructor(capture: Capture, character: Character, name: string) {
    this.show = capture.show;
    this.capture = capture;
    this.character = character;
    this.name = name.trim();
  }
}
