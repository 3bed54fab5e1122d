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

// ─── Tissue profile, controls and take (learned by `learn`, used by `retarget` and live tuning) ───

/** A motion signal of a driver joint, each three components in the joint's own frame. */
export type DriverSignal = 'specificForce' | 'angularVelocity' | 'angularAcceleration';

/** A joint whose motion drives the dynamics; contributes 3 inputs per signal. */
export interface Driver {
  /** Joint name in the source character's skeleton. */
  joint: string;
  /** Signals taken from it, in this order. */
  signals: DriverSignal[];
}

/** Why a mode deserves a second look. */
export type ModeFlag = 'real-negative-pole' | 'near-nyquist' | 'overdamped';

/** One oscillation of a profile. */
export interface Mode {
  /** Natural frequency f_n = |s| / 2π, in hertz. */
  frequencyHz: number;
  /** Damping ratio ζ = −Re(s) / |s|. */
  dampingRatio: number;
  /** Name of the region whose vertices move most in this mode. */
  region: string;
  /** Share of the dynamic displacement energy this mode carries (all modes sum to 1). */
  energyShare: number;
  /** Observations, e.g. a mode near the Nyquist frequency. */
  flags: ModeFlag[];
}

/** A peak of a region's power spectral density. */
export interface SpectrumPeak {
  region: string;
  frequencyHz: number;
  /** Power spectral density at the peak, m²/Hz. */
  power: number;
}

/** How well a profile fits frames it never saw (the last 20 % of the capture). */
export interface FitReport {
  trainFrames: number;
  heldOutFrames: number;
  /** Normalised RMS error of one-step-ahead prediction of the coefficients. */
  oneStepNrmse: number;
  /** Normalised RMS error of a free run from the held-out start, driven by the inputs only. */
  freeRunNrmse: number;
  /** Share of held-out dynamic variance the free run explains. */
  varianceExplained: number;
  /** 1 − max |z| over the poles. */
  stabilityMargin: number;
  /** Shares of the unposed residual variance explained by the pose-driven and dynamic parts. */
  poseShare: number;
  dynamicShare: number;
  /** Spectrum peaks per region (Welch PSD of the dynamic displacement). */
  spectrumPeaks: SpectrumPeak[];
}

/** Pose-driven deformation: per vertex, a linear map from local pose features to a rest-space offset. */
export interface PoseCorrectives {
  /** Features per vertex (same for every vertex): 9 per influencing joint slot (entries of R − I). */
  featuresPerVertex: number;
  /** Joint index of each of the 4 slots per vertex (4N), usually the skin joints. */
  featureJoints: Uint16Array;
  /** Coefficients, vertex-major: vertex i, axis a (x, y, z), feature f at ((i·3 + a)·F + f) (N·3·F). */
  coefficients: Float32Array;
  /** Ridge strength chosen on held-out frames. */
  ridgeLambda: number;
  /**
   * Range of each joint's features over the training frames (J × 9, indexed like featureJoints):
   * features are clamped into it when the correctives are evaluated, so a pose beyond the capture
   * holds the corrective it reached instead of extrapolating. Absent in profiles written before
   * it existed (evaluated unclamped).
   */
  featureMin?: Float64Array;
  featureMax?: Float64Array;
}

/**
 * Second-order ARX dynamics on the basis coefficients c_t ∈ R^K with scaled inputs u_t ∈ R^M:
 * c_t = A1 c_{t−1} + A2 c_{t−2} + B0 u_t + B1 u_{t−1}, matrices row-major.
 */
export interface LinearDynamics {
  /** Basis size K. */
  k: number;
  /** Input count M (3 per driver signal). */
  m: number;
  a1: Float64Array;
  a2: Float64Array;
  b0: Float64Array;
  b1: Float64Array;
  /** Inputs are scaled as (u − inputMean) / inputScale before entering B0, B1. */
  inputMean: Float64Array;
  inputScale: Float64Array;
}

/** What the solver learned from one capture. */
export interface TissueProfile {
  formatVersion: 1;
  /** Content hash of the serialised profile (hex). */
  id: string;
  name: string;
  /** Rate the dynamics were identified at. */
  fps: number;
  /** Settings the profile was learned with (cut-off, caps, seeds…), for the record. */
  settings: Record<string, number | string | boolean>;
  /** The source character: rest mesh, skeleton, skin and regions (for transfer). */
  source: Character;
  drivers: Driver[];
  /** Dynamic basis in the source's rest space: column k of length 3N at [k·3N, (k+1)·3N). */
  basis: Float32Array;
  /** Singular value of each basis column. */
  singularValues: Float64Array;
  correctives: PoseCorrectives;
  dynamics: LinearDynamics;
  modes: Mode[];
  fitReport: FitReport;
}

/** The artist's controls of a retarget. */
export interface Controls {
  /** Scales all dynamic displacement (linear). */
  gain: number;
  /** Per-region gain by region name (missing regions: 1), blended smoothly at borders. */
  regionGains: Record<string, number>;
  /** Multiplies every mode's natural frequency. */
  stiffness: number;
  /** Multiplies every mode's damping ratio. */
  damping: number;
  /** Seconds the first pose is held before the shot so it starts at rest. */
  prerollSeconds: number;
  /** Dynamic similarity by size (on) or frequencies kept (off, stylised). */
  physicalScaling: boolean;
  /** Exponent of the length ratio for frequencies (−0.5 gravity-dominated; −1 same-material elastic). */
  sizeExponent: number;
  /** Indices into the profile's modes to silence. */
  mutedModes: number[];
  /** Indices into the profile's modes to play alone (empty: all). */
  soloModes: number[];
  /** Largest displacement of any vertex in metres, or null for no clamp. */
  maxDisplacement: number | null;
}

// ─── Retarget: modal form, live-tuning data and take ───

/**
 * Second-order dynamics in modal form: the 2K eigenvalues z of the companion matrix
 * [[A1, A2], [I, 0]] and their mode vectors v (the eigenvector's lower half, K entries), so that
 * (z²I − zA1 − A2) v = 0. A complex pair is stored adjacently, positive imaginary part first.
 */
export interface ModalForm {
  /** Basis size K. */
  k: number;
  /** Rate the poles are discrete at. */
  fps: number;
  /** Real and imaginary parts of each pole (2K). */
  zRe: Float64Array;
  zIm: Float64Array;
  /** Real and imaginary parts of each mode vector, pole-major: pole i at [i·K, (i+1)·K). */
  vRe: Float64Array;
  vIm: Float64Array;
  /** Index into the profile's modes for each pole (−1 when no mode describes it). */
  modeOf: Int32Array;
}

/** Everything live tuning needs to re-simulate a take without the profile. */
export interface LiveTuneData {
  /** Basis size K. */
  k: number;
  /** Rate the dynamics run at (the profile's). */
  simFps: number;
  /** Simulated frames, pre-roll included. */
  simFrames: number;
  /** Drive e_t = B0 u_t + B1 u_{t−1} at the simulation rate (simFrames × K, frame-major). */
  drive: Float32Array;
  /** Dynamics after size scaling, before stiffness and damping. */
  modal: ModalForm;
  /** Shot frames (T). */
  frameCount: number;
  /** Shot rate. */
  fps: number;
  /** Per shot frame, the 4 simulation frames it interpolates (4T) and their weights (4T). */
  sampleIndex: Int32Array;
  sampleWeight: Float64Array;
}

/** Figures describing a take. */
export interface TakeMetrics {
  /** Length ratio λ = L_target / L_source. */
  lengthRatio: number;
  /** Factor applied to every natural frequency by size (1 when physical scaling is off). */
  frequencyFactor: number;
  /** Largest vertex displacement of the dynamic part over the shot, metres. */
  peakDisplacement: number;
  /** RMS of the dynamic displacement over vertices and frames, metres. */
  rmsDisplacement: number;
  /** Largest pole magnitude after the controls. */
  maxPoleMagnitude: number;
  /** Whether the topology was shared (identity transfer) or transferred by closest points. */
  transfer: 'identity' | 'closest-point';
}

/** A retargeted shot: the target's dynamic basis, its coefficients and how to re-tune it. */
export interface Take {
  formatVersion: 1;
  /** Profile the take came from. */
  profileId: string;
  profileName: string;
  controls: Controls;
  /** Shot rate and frames. */
  fps: number;
  frameCount: number;
  /** Basis on the target's rest mesh with region gains baked: column k at [k·3N', (k+1)·3N'). */
  basis: Float32Array;
  /** Per-vertex gain baked into the basis (N'). */
  vertexGains: Float32Array;
  /** The profile's pose correctives carried onto the target (the take .glb holds them as corrective morph targets over the shot). */
  correctives: PoseCorrectives;
  /** Dynamic coefficients c_t per shot frame (T × K), before gain. */
  coefficients: Float32Array;
  /** Morph weights per shot frame (T × K): coefficients × gain, displacement clamp applied. */
  weights: Float32Array;
  /** A1′, A2′ after the controls, at the simulation rate (K × K, row-major). */
  a1: Float64Array;
  a2: Float64Array;
  /** Modes after size scaling and the controls, in the profile's order. */
  modes: Mode[];
  live: LiveTuneData;
  metrics: TakeMetrics;
  /** Non-fatal observations (unmapped drivers, modes near Nyquist, …). */
  warnings: string[];
}
