// What the solver reads from an uploaded file, or the typed error that says why it cannot.
import {
  inspectFile,
  isSolverInputError,
  readCapture,
  readCharacter,
  readClip,
  validateCapture,
  type Character as SolverCharacter,
} from '@overshoot/solver';
import type { BoundingBox } from '../../library/entities/character.entity';
import { AssetKind } from '../entities/asset.entity';

/** A file that cannot be accepted: what is wrong and where (becomes the validation report). */
export class BadFile extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly where: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = 'BadFile';
  }
}

/** Metadata of a character file. */
export interface CharacterFacts {
  kind: AssetKind.Character;
  vertexCount: number;
  triangleCount: number;
  joints: string[];
  regions: string[] | null;
  bbox: BoundingBox | null;
}

/** Metadata of a capture file. */
export interface CaptureFacts {
  kind: AssetKind.Capture;
  frameCount: number;
  fps: number;
}

/** Metadata of a clip file. */
export interface ClipFacts {
  kind: AssetKind.Clip;
  frameCount: number;
  fps: number;
  joints: string[];
}

/** What ingest records about an accepted file. */
export type AssetFacts = CharacterFacts | CaptureFacts | ClipFacts;

/** Turns the solver's typed input errors into BadFile; anything else passes through. */
async function solver<T>(run: () => Promise<T> | T): Promise<T> {
  try {
    return await run();
  } catch (e) {
    if (isSolverInputError(e)) throw new BadFile(e.code, e.message, { ...e.where });
    throw e;
  }
}

/**
 * Reads the file as its declared kind. A capture is also checked against the character it is
 * registered to (`characterBytes`): same topology, rate, length and joints.
 */
export async function readAsset(
  kind: AssetKind,
  bytes: Uint8Array,
  fileName: string,
  characterBytes?: () => Promise<Uint8Array>,
): Promise<AssetFacts> {
  const summary = await solver(() => inspectFile(bytes, fileName));
  if (summary.kind !== kind) {
    throw new BadFile('WRONG_KIND', `The file holds a ${summary.kind}, not a ${kind}.`, {
      item: fileName,
      found: summary.kind,
    });
  }
  if (kind === AssetKind.Character) {
    const character = await solver(() => readCharacter(bytes));
    return {
      kind,
      vertexCount: character.restPositions.length / 3,
      triangleCount: character.triangles.length / 3,
      joints: character.skeleton.names,
      regions: character.regions?.names ?? null,
      bbox: summary.boundingBox,
    };
  }
  if (kind === AssetKind.Capture) {
    const capture = await solver(() => readCapture(bytes));
    if (!characterBytes) throw new Error('a capture is checked against its character');
    const character: SolverCharacter = await solver(async () =>
      readCharacter(await characterBytes()),
    );
    await solver(() => validateCapture(character, capture));
    return { kind, frameCount: capture.frameCount, fps: capture.fps };
  }
  const format = /\.bvh$/i.test(fileName) ? 'bvh' : 'gltf';
  const clip = await solver(() => readClip(bytes, format));
  return { kind, frameCount: clip.frameCount, fps: clip.fps, joints: clip.jointNames };
}
