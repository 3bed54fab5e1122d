// Public entry of the Overshoot solver library. Exports by name.
export type {
  Capture,
  Character,
  Clip,
  Controls,
  Driver,
  DriverSignal,
  FitReport,
  LinearDynamics,
  Mode,
  ModeFlag,
  Pose,
  PoseCorrectives,
  Regions,
  Skeleton,
  SpectrumPeak,
  TissueProfile,
} from './types.js';
export { SolverInputError, isSolverInputError } from './errors.js';
export type { ErrorLocation, SolverErrorCode } from './errors.js';

export {
  readCharacter,
  characterFromDocument,
  READ_CHARACTER_DEFAULTS,
} from './io/gltf-character.js';
export type { ReadCharacterOptions } from './io/gltf-character.js';
export { readCapture, captureFromDocument } from './io/gltf-capture.js';
export { readGltfClip, clipFromDocument, READ_GLTF_CLIP_DEFAULTS } from './io/gltf-clip.js';
export type { ReadGltfClipOptions } from './io/gltf-clip.js';
export { readBvh, READ_BVH_DEFAULTS } from './io/bvh.js';
export type { ReadBvhOptions } from './io/bvh.js';
export { readClip } from './io/read-clip.js';
export type { ClipKind, ReadClipOptions } from './io/read-clip.js';
export { evaluateSampler } from './io/gltf-sampling.js';
export type { Interpolation, SamplerData } from './io/gltf-sampling.js';
export { checkGlbContainer, isGlb, openGlb } from './io/glb-container.js';
export { writeCharacterGlb } from './io/glb-character-writer.js';
export { writeClipGlb } from './io/glb-clip-writer.js';
export type { WriteClipOptions } from './io/glb-clip-writer.js';
export { writeCaptureGlb } from './io/glb-capture-writer.js';
export type { WriteCaptureOptions } from './io/glb-capture-writer.js';
export { validateCapture, VALIDATE_CAPTURE_DEFAULTS } from './io/validate-capture.js';
export type { ValidateCaptureOptions } from './io/validate-capture.js';
export { inspectFile } from './io/inspect.js';
export type { FileSummary } from './io/inspect.js';
export { computeNormals } from './io/gltf-mesh.js';

export {
  createPose,
  restPose,
  worldMatrices,
  skinningMatrices,
  matchClipJoints,
  clipFramePose,
  clipWorldMatrices,
  parentsFirstOrder,
  JOINT_MATCH_DEFAULTS,
} from './rig/skeleton.js';
export type { JointMatchOptions } from './rig/skeleton.js';
export { skinPositions, skinNormals } from './rig/linear-blend.js';
export { normaliseSkinWeights, dominantJoints, SKIN_WEIGHT_DEFAULTS } from './rig/skin-weights.js';
export type { SkinInfluences, SkinWeightOptions } from './rig/skin-weights.js';
export { deriveRegions, regionsFromLabels } from './rig/regions.js';
export { resampleClip } from './rig/resample-clip.js';
export { estimatePoses, ESTIMATE_POSES_DEFAULTS } from './rig/pose-estimate.js';
export type { EstimatePosesOptions, PoseEstimate } from './rig/pose-estimate.js';
export { unpose, unposeFrame } from './rig/unpose.js';
export type { UnposeResult } from './rig/unpose.js';

export {
  quatMultiply,
  quatConjugate,
  quatDot,
  quatNormalize,
  quatFromAxisAngle,
  quatSlerp,
  quatRotateVec3,
  quatFromMat4,
  quatMakeContinuous,
} from './linalg/quat.js';
export {
  mat4Identity,
  mat4Compose,
  mat4Multiply,
  mat4Invert,
  mat4TransformPoint,
  mat4Copy,
} from './linalg/mat4.js';
export { mat3Determinant, mat3Invert, mat3FromMat4 } from './linalg/mat3.js';
export { symmetricEigen } from './linalg/sym-eigen.js';
export { createRigidFit, fitRigidTransform } from './linalg/rigid-fit.js';
export type { RigidFit } from './linalg/rigid-fit.js';
export type { NumArray } from './linalg/types.js';
