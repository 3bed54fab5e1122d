// The coach's known soft tissue (invented values within the ranges the solver must handle:
// 1.5–8 Hz, damping ratio 0.05–0.4). Frequencies differ mode to mode so each can be told apart;
// the two belly modes share a region but move in different directions.
import type { TissueSpec } from './tissue-spec.js';

const UP = [0, 1, 0] as const;
const NONE = [0, 0, 0] as const;
const FRONT = [0, 0, 1] as const;

/** Modes and correctives of Coach Madge. */
export const COACH_TISSUE: TissueSpec = {
  modes: [
    {
      id: 'belly-bounce',
      region: 'belly',
      driver: 'Spine',
      frequencyHz: 2.2,
      dampingRatio: 0.12,
      inputGain: [0, -0.21, 0],
      shape: { direction: UP, normalWeight: 0.35, fromBone: true },
    },
    {
      id: 'belly-sway',
      region: 'belly',
      driver: 'Hips',
      frequencyHz: 1.6,
      dampingRatio: 0.07,
      inputGain: [-0.36, 0, 0],
      shape: { direction: [1, 0, 0], normalWeight: 0, fromBone: true },
    },
    {
      id: 'chest-bounce',
      region: 'chest',
      driver: 'Spine2',
      frequencyHz: 3.0,
      dampingRatio: 0.15,
      inputGain: [0, -0.38, 0],
      shape: { direction: UP, normalWeight: 0.2, fromBone: true },
    },
    {
      id: 'upper-arm-sag-l',
      region: 'upper_arm_l',
      driver: 'LeftArm',
      frequencyHz: 4.2,
      dampingRatio: 0.2,
      inputGain: [0, -0.8, 0],
      shape: { direction: UP, normalWeight: 0, favour: [0, -1, 0] },
    },
    {
      id: 'upper-arm-sag-r',
      region: 'upper_arm_r',
      driver: 'RightArm',
      frequencyHz: 4.6,
      dampingRatio: 0.22,
      inputGain: [0, -0.95, 0],
      shape: { direction: UP, normalWeight: 0, favour: [0, -1, 0] },
    },
    {
      id: 'glutes-bounce',
      region: 'glutes',
      driver: 'Hips',
      frequencyHz: 3.4,
      dampingRatio: 0.18,
      inputGain: [0, -0.37, 0],
      shape: { direction: UP, normalWeight: 0.2, fromBone: true },
    },
    {
      id: 'cheeks-jiggle',
      region: 'cheeks',
      driver: 'Head',
      frequencyHz: 6.5,
      dampingRatio: 0.3,
      inputGain: [0, -1, 0],
      shape: { direction: UP, normalWeight: 0.3, fromBone: true },
    },
  ],
  correctives: [
    {
      id: 'biceps-bulge-l',
      region: 'upper_arm_l',
      joint: 'LeftForeArm',
      bone: 'LeftArm',
      along: 0.55,
      amplitude: 0.02,
      shape: { direction: NONE, normalWeight: 1, favour: FRONT },
    },
    {
      id: 'biceps-bulge-r',
      region: 'upper_arm_r',
      joint: 'RightForeArm',
      bone: 'RightArm',
      along: 0.55,
      amplitude: 0.02,
      shape: { direction: NONE, normalWeight: 1, favour: FRONT },
    },
    {
      id: 'hip-crease-l',
      region: 'thigh_l',
      joint: 'LeftUpLeg',
      bone: 'LeftUpLeg',
      along: 0.12,
      amplitude: 0.03,
      shape: { direction: NONE, normalWeight: 1, favour: FRONT },
    },
    {
      id: 'hip-crease-r',
      region: 'thigh_r',
      joint: 'RightUpLeg',
      bone: 'RightUpLeg',
      along: 0.12,
      amplitude: 0.03,
      shape: { direction: NONE, normalWeight: 1, favour: FRONT },
    },
  ],
};
