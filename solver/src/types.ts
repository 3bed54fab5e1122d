// Core data types. Dense data lives in typed arrays; quaternions are [x, y, z, w]; lengths in metres.

/**
 * Joint hierarchy with rest pose. Joints are ordered so that every parent comes before its
 * children (parents[j] < j, or -1 for a root).
 */
export interface Skeleton {
  /** Joint names, unique. */
  names: string[];
  /** Parent index per joint, -1 for roots. */
  parents: Int32Array;
  /** Rest local translation per joint (3J). */
  restTranslations: Float64Array;
  /** Rest local rotation per joint (4J, unit quaternions). */
  restRotations: Float64Array;
  /** Rest local scale per joint (3J). */
  restScales: Float64Array;
  /** Inverse bind matrix per joint (16J, column-major). */
  inverseBindMatrices: Float64Array;
  /** World matrix of the node that holds the root joints (16, column-major; identity when none). */
  rootParentMatrix: Float64Array;
}

/** Per-vertex region labels with their names. */
export interface Regions {
  /** Region index per vertex (N). */
  labels: Uint16Array;
  /** Region names, indexed by label. */
  names: string[];
  /** Where the labels came from. */
  source: 'attribute' | 'dominant-joint';
}

/** A rigged character: rest mesh, skeleton and skin. */
export interface Character {
  /** Name of the skinned mesh (or node) it was read from. */
  name: string;
  /** Rest positions in bind space (3N). */
  restPositions: Float32Array;
  /** Rest normals (3N), computed from triangles when the file has none. */
  restNormals: Float32Array;
  /** Triangle vertex indices (3F). */
  triangles: Uint32Array;
  /** Joint hierarchy. */
  skeleton: Skeleton;
  /** Four joint indices per vertex (4N). */
  skinJoints: Uint16Array;
  /** Four weights per vertex summing to 1 (4N). */
  skinWeights: Float32Array;
  /** Optional region labels. */
  regions: Regions | null;
  /** Non-fatal observations made while reading. */
  warnings: string[];
}

/**
 * Skeletal motion sampled at a fixed rate. Frame-major layout: value of joint j at frame t
 * starts at (t * J + j) * size.
 */
export interface Clip {
  /** Name of the clip. */
  name: string;
  /** Frames per second (> 0). */
  fps: number;
  /** Number of frames (≥ 1). */
  frameCount: number;
  /** Joint names. */
  jointNames: string[];
  /** Parent index per joint, -1 for roots; parents come before children. */
  parents: Int32Array;
  /** Rest local translation (bone offset) per joint (3J). */
  offsets: Float64Array;
  /** Local rotation per frame and joint (4JT, unit quaternions, signs continuous in time). */
  rotations: Float32Array;
  /** Local translation per frame and joint (3JT); equals the offset where not animated. */
  translations: Float32Array;
  /** 1 where a joint's translation is animated (always for roots that move), else 0 (J). */
  translationAnimated: Uint8Array;
  /** Non-fatal observations made while reading. */
  warnings: string[];
}

/** A captured mesh sequence in one topology. */
export interface Capture {
  /** Name of the captured mesh. */
  name: string;
  /** Frames per second (> 0). */
  fps: number;
  /** Number of frames. */
  frameCount: number;
  /** Vertices per frame. */
  vertexCount: number;
  /** Positions for all frames in one array (T × 3N, frame-major). */
  positions: Float32Array;
  /** Base (rest) positions of the mesh the frames are stored against (3N). */
  basePositions: Float32Array;
  /** Triangle vertex indices (3F). */
  triangles: Uint32Array;
  /** The skeleton's motion when the file carries it, else null. */
  clip: Clip | null;
  /** Non-fatal observations made while reading. */
  warnings: string[];
}

/** Local joint transforms of one pose (rotations 4J, translations 3J). */
export interface Pose {
  /** Local rotation per joint (4J). */
  rotations: Float64Array;
  /** Local translation per joint (3J). */
  translations: Float64Array;
}
