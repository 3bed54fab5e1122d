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

// ─── Retarget, take output and live tuning ───
export type { LiveTuneData, ModalForm, Take, TakeMetrics } from './types.js';
export {
  jointNameKey,
  mapJoints,
  parseJointMap,
  mapDrivers,
  driverEnergyShares,
  DRIVER_MAP_DEFAULTS,
} from './rig/joint-map.js';
export type {
  DriverMapOptions,
  DriverMapping,
  JointMapEntry,
  JointMapping,
  JointMatch,
} from './rig/joint-map.js';
export { transferBasis, sameTopology } from './retarget/transfer.js';
export type { TransferResult } from './retarget/transfer.js';
export { jointBindPositions, lengthRatio, sizeFrequencyFactor } from './retarget/scaling.js';
export { CONTROLS_DEFAULTS, resolveControls, poleMask, clampFactor } from './retarget/controls.js';
export {
  createPoleEditor,
  editPoles,
  rebuildDynamics,
  modeProjection,
  MAX_POLE_MAGNITUDE,
} from './retarget/pole-edit.js';
export type { PoleEditor } from './retarget/pole-edit.js';
export { modalForm, poleGroups } from './retarget/modal-form.js';
export {
  vertexGainField,
  characterRegionNames,
  REGION_GAIN_DEFAULTS,
} from './retarget/region-gains.js';
export type { RegionGainOptions } from './retarget/region-gains.js';
export { clipFrameRange, holdFirstPose, simulationClip } from './retarget/shot-clip.js';
export type { SimulationClip } from './retarget/shot-clip.js';
export { retarget, RETARGET_DEFAULTS } from './retarget/retarget.js';
export type { RetargetOptions, RetargetResult, RetargetStage } from './retarget/retarget.js';
export { takeModes, takeMetrics } from './retarget/take-metrics.js';
export { transferCorrectives } from './retarget/transfer-correctives.js';
export { takeFramePositions } from './retarget/take-positions.js';
export { resampleClipCubic } from './rig/resample-clip-cubic.js';
export { createLiveTuner, largestDisplacement, clampIndex } from './live/live-tune.js';
export type { LiveControls, LiveTuner } from './live/live-tune.js';
export { rescaleRegionGains } from './live/region-rescale.js';
export { luFactor, luSolve } from './linalg/lu-solve.js';
export { writeTake, writeTakeGlb } from './io/take-writer.js';
export type { WriteTakeOptions, WrittenTake } from './io/take-writer.js';
export { readTakeGlb } from './io/take-reader.js';
export type { TakeFile } from './io/take-reader.js';
export {
  takeExtras,
  liveTuneDataFromExtras,
  asTakeExtras,
  takeMorphLayout,
  morphWeightsOf,
  setDynamicMorphWeights,
  TAKE_EXTRAS_VERSION,
} from './io/take-extras.js';
export type { TakeExtras, TakeMorphLayout } from './io/take-extras.js';
export { correctiveMorphs, CORRECTIVE_MORPH_DEFAULTS } from './retarget/corrective-morphs.js';
export type { CorrectiveMorphOptions, CorrectiveMorphs } from './retarget/corrective-morphs.js';
export { packArray, unpackArray, encodeBase64, decodeBase64 } from './io/packed-arrays.js';
export type { PackedArray, PackedType } from './io/packed-arrays.js';
// ─── end retarget ───

// ─── learn: tissue profiles ───
export { learnProfile, LEARN_DEFAULTS } from './learn/learn.js';
export type { LearnOptions, LearnResult, LearnStage } from './learn/learn.js';
export {
  separatePoseDriven,
  SEPARATE_DEFAULTS,
  MIN_FEATURE_RMS,
  influencingJoints,
} from './learn/separate.js';
export type { SeparateOptions, Separation } from './learn/separate.js';
export {
  poseFeatures,
  applyCorrectives,
  clampFeatures,
  featureRange,
  FEATURES_PER_JOINT,
} from './learn/pose-features.js';
export { selectDrivers, SELECT_DRIVERS_DEFAULTS } from './learn/select-drivers.js';
export type { SelectDriversOptions } from './learn/select-drivers.js';
export { dynamicSubspace, leadingSubspace } from './learn/dynamic-subspace.js';
export type { DynamicSubspace, SubspaceMethod } from './learn/dynamic-subspace.js';
export { regionSpectra, modesMatchPeaks } from './learn/region-spectra.js';
export type { RegionSpectrum } from './learn/region-spectra.js';
export { fitReport, nrmse } from './learn/fit-report.js';
export { checkFinite, checkMoves, clipForCapture } from './learn/check-capture.js';
export {
  driverInputs,
  restDriverInputs,
  driverInputCount,
  driverJointIndices,
  ALL_DRIVER_SIGNALS,
  GRAVITY,
} from './dynamics/driver-inputs.js';
export type { DriverInputs } from './dynamics/driver-inputs.js';
export {
  savitzkyGolay,
  savitzkyGolayWeights,
  SAVITZKY_GOLAY_DEFAULTS,
} from './dynamics/savitzky-golay.js';
export type { SavitzkyGolayOptions } from './dynamics/savitzky-golay.js';
export { lowPassZeroPhase, butterworthSections, LOW_PASS_DEFAULTS } from './dynamics/low-pass.js';
export type { LowPassOptions } from './dynamics/low-pass.js';
export { fitArx, ARX_FIT_DEFAULTS } from './dynamics/arx-fit.js';
export type { ArxFitOptions, ArxModel } from './dynamics/arx-fit.js';
export { identifyDynamics, IDENTIFY_DEFAULTS } from './dynamics/identify.js';
export type { Identification, IdentifyOptions } from './dynamics/identify.js';
export { enforceStability, MAX_POLE_RADIUS } from './dynamics/stability.js';
export type { StabilityResult } from './dynamics/stability.js';
export {
  companionEigen,
  poleToModal,
  modalToPole,
  rebuildFromPoles,
  spectralRadius,
} from './dynamics/poles.js';
export type { CompanionEigen } from './dynamics/poles.js';
export { identifyModes, MODES_DEFAULTS } from './dynamics/modes.js';
export type { ModesOptions } from './dynamics/modes.js';
export {
  freeRun,
  oneStepPrediction,
  scaleInputs,
  simulateDynamics,
  arxOfDynamics,
} from './dynamics/simulate.js';
export { welchPsd, spectrumPeaks, floorPowerOfTwo } from './dynamics/spectrum.js';
export type { Spectrum, WelchOptions } from './dynamics/spectrum.js';
export { gramBasis, basisFromGram } from './linalg/gram-basis.js';
// Optional worker threads for the big products (Node; in browsers start resolves to 0). The
// module imports node:worker_threads only inside startKernelThreads, so bundles stay clean.
export {
  startKernelThreads,
  stopKernelThreads,
  kernelThreadCount,
  KERNEL_THREADS_DEFAULTS,
} from './linalg/kernel-threads.js';
export type { KernelThreadsOptions } from './linalg/kernel-threads.js';
export { snapshotGram, multiplyTransposed, multiplyByRows } from './linalg/gram-kernel.js';
export { randomizedSvd, RANDOMIZED_SVD_DEFAULTS } from './linalg/randomized-svd.js';
export type { RandomizedSvdOptions } from './linalg/randomized-svd.js';
export { topEigen, TOP_EIGEN_DEFAULTS } from './linalg/top-eigen.js';
export type { TopEigen, TopEigenOptions } from './linalg/top-eigen.js';
export { chooseRank, RANK_RULE_DEFAULTS } from './linalg/rank-rule.js';
export type { RankChoice, RankRuleOptions } from './linalg/rank-rule.js';
export { ridgeSolve, cholesky, choleskySolve, gramColumns, crossColumns } from './linalg/ridge.js';
export { fixSigns } from './linalg/sign-fix.js';
export { orthonormaliseRows, orthonormaliseColumns } from './linalg/orthonormalise.js';
export { seededUniform, seededNormal } from './linalg/seeded-random.js';
export { frobeniusSquared } from './linalg/subspace.js';
export type { Subspace } from './linalg/subspace.js';
export {
  readProfile,
  writeProfile,
  profileId,
  PROFILE_FORMAT_VERSION,
} from './io/profile-format.js';
export { sha256Hex } from './io/sha-256.js';
// ─── end learn ───
