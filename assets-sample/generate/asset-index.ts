// The list of generated assets, as written into files/manifest.json and used by the show seed and
// the contact sheet. Paths are relative to the files/ folder.

/** A generated character. */
export interface CharacterEntry {
  key: string;
  title: string;
  description: string;
  file: string;
  vertices: number;
  triangles: number;
  joints: number;
  namingConvention: string;
  regions: string[];
  /** A clip on this character's skeleton, for previews. */
  previewClip: { file: string; name: string } | null;
}

/** A generated clip (the same motion as BVH and as glTF animation). */
export interface ClipEntry {
  key: string;
  title: string;
  description: string;
  /** Key of the character whose skeleton it is authored on. */
  character: string;
  fps: number;
  frameCount: number;
  bvh: string;
  glb: string;
}

/** A generated synthetic capture with its ground truth. */
export interface CaptureEntry {
  key: string;
  title: string;
  description: string;
  character: string;
  /** Key of the clip the capture's skeleton follows. */
  clip: string;
  fps: number;
  frameCount: number;
  file: string;
  groundTruth: string;
  groundTruthBin: string;
  /** Measurement noise per coordinate (m); 0 when noise-free. */
  noiseSigmaMetres: number;
  modes: string[];
}

/** Everything generated, by kind. */
export interface AssetIndex {
  characters: CharacterEntry[];
  clips: ClipEntry[];
  captures: CaptureEntry[];
}
