// Joint maps an artist gives when a profile learned on one rig drives another whose joints are
// named differently (the `jointMap` of a retarget job): source joint → target joint. The demo's
// profile is learned on the coach (Hips, Spine1, LeftArm…); the creature names its joints
// root, spine.001, flipper_upper.L…, so name matching alone leaves the main drivers unmapped.

/** By source character key, then target character key (the demo file's keys): the map. */
export const DEMO_JOINT_MAPS: Record<string, Record<string, Record<string, string>>> = {
  'coach-madge': {
    'creature-grumbletusk': {
      Hips: 'root',
      Spine: 'spine.001',
      Spine1: 'spine.002',
      Spine2: 'spine.003',
      Neck: 'neck',
      Head: 'head',
      LeftShoulder: 'shoulder.L',
      LeftArm: 'flipper_upper.L',
      LeftForeArm: 'flipper_lower.L',
      LeftHand: 'flipper_hand.L',
      RightShoulder: 'shoulder.R',
      RightArm: 'flipper_upper.R',
      RightForeArm: 'flipper_lower.R',
      RightHand: 'flipper_hand.R',
      LeftUpLeg: 'hindflipper_upper.L',
      LeftLeg: 'hindflipper_lower.L',
      LeftFoot: 'hindflipper_foot.L',
      RightUpLeg: 'hindflipper_upper.R',
      RightLeg: 'hindflipper_lower.R',
      RightFoot: 'hindflipper_foot.R',
    },
    'swimmer-otto': {
      Hips: 'pelvis',
      Spine: 'spine_01',
      Spine1: 'spine_02',
      Spine2: 'spine_03',
      Neck: 'neck_01',
      Head: 'head',
      LeftShoulder: 'clavicle_l',
      LeftArm: 'upperarm_l',
      LeftForeArm: 'lowerarm_l',
      LeftHand: 'hand_l',
      RightShoulder: 'clavicle_r',
      RightArm: 'upperarm_r',
      RightForeArm: 'lowerarm_r',
      RightHand: 'hand_r',
      LeftUpLeg: 'thigh_l',
      LeftLeg: 'calf_l',
      LeftFoot: 'foot_l',
      LeftToeBase: 'ball_l',
      RightUpLeg: 'thigh_r',
      RightLeg: 'calf_r',
      RightFoot: 'foot_r',
      RightToeBase: 'ball_r',
    },
  },
};
