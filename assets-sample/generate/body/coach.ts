// Coach Madge Brackwater (invented): the stout swimming coach of the Saltmarrow Lido. Short,
// broad, a round belly, heavy upper arms and cheeks: the character the synthetic captures use.
// Joints are named Left/Right-prefixed in PascalCase ("LeftUpLeg").
import { lerp3, mirror, type BodyPlan, type JointSpec, type PartSpec } from './body-plan.js';
import type { Vec3 } from './sdf.js';

const SIDES = [
  ['Left', 1],
  ['Right', -1],
] as const;

function joints(): JointSpec[] {
  const out: JointSpec[] = [
    { name: 'Hips', parent: null, at: [0, 0.93, 0] },
    { name: 'Spine', parent: 'Hips', at: [0, 1.03, 0.01] },
    { name: 'Spine1', parent: 'Spine', at: [0, 1.15, 0.01] },
    { name: 'Spine2', parent: 'Spine1', at: [0, 1.27, 0] },
    { name: 'Neck', parent: 'Spine2', at: [0, 1.42, -0.01] },
    { name: 'Head', parent: 'Neck', at: [0, 1.5, 0], tip: [0, 1.72, 0.01] },
  ];
  for (const [side, s] of SIDES) {
    const m = (p: Vec3): Vec3 => (s > 0 ? p : mirror(p));
    out.push(
      { name: `${side}Shoulder`, parent: 'Spine2', at: m([0.05, 1.38, 0]) },
      { name: `${side}Arm`, parent: `${side}Shoulder`, at: m([0.19, 1.37, -0.01]) },
      { name: `${side}ForeArm`, parent: `${side}Arm`, at: m([0.4, 1.19, 0]) },
      {
        name: `${side}Hand`,
        parent: `${side}ForeArm`,
        at: m([0.585, 1.035, 0.02]),
        tip: m([0.69, 0.945, 0.035]),
      },
    );
  }
  for (const [side, s] of SIDES) {
    const m = (p: Vec3): Vec3 => (s > 0 ? p : mirror(p));
    out.push(
      { name: `${side}UpLeg`, parent: 'Hips', at: m([0.13, 0.88, 0]) },
      { name: `${side}Leg`, parent: `${side}UpLeg`, at: m([0.14, 0.49, 0.015]) },
      { name: `${side}Foot`, parent: `${side}Leg`, at: m([0.14, 0.085, -0.01]) },
      { name: `${side}ToeBase`, parent: `${side}Foot`, at: m([0.14, 0.025, 0.11]), tip: m([0.14, 0.03, 0.17]) }, // prettier-ignore
    );
  }
  return out;
}

function parts(j: Map<string, Vec3>): PartSpec[] {
  const front: Vec3 = [0, 0, 1];
  const out: PartSpec[] = [
    { shape: { kind: 'ellipsoid', c: [0, 0.93, -0.005], r: [0.2, 0.14, 0.15] }, bones: ['Hips', 'Spine'] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.04, 0.055], r: [0.215, 0.2, 0.2] }, bones: ['Hips', 'Spine', 'Spine1'], region: 'belly', facing: front }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.13, -0.02], r: [0.19, 0.17, 0.15] }, bones: ['Spine', 'Spine1'] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.27, 0.0], r: [0.2, 0.15, 0.145] }, bones: ['Spine1', 'Spine2'] }, // prettier-ignore
    { shape: { kind: 'cone', a: [-0.2, 1.355, -0.015], b: [0.2, 1.355, -0.015], ra: 0.075, rb: 0.075 }, bones: ['Spine2', 'LeftShoulder', 'RightShoulder', 'LeftArm', 'RightArm'] }, // prettier-ignore
    { shape: { kind: 'cone', a: [0, 1.36, -0.01], b: [0, 1.53, 0], ra: 0.066, rb: 0.058 }, bones: ['Spine2', 'Neck', 'Head'] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.61, 0.01], r: [0.1, 0.12, 0.108] }, bones: ['Head'] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.525, 0.05], r: [0.085, 0.05, 0.065] }, bones: ['Head', 'Neck'], region: 'cheeks' }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.6, 0.11], r: [0.022, 0.03, 0.025] }, bones: ['Head'] }, // prettier-ignore
  ];
  for (const [side, s] of SIDES) {
    const m = (p: Vec3): Vec3 => (s > 0 ? p : mirror(p));
    const g = (n: string) => j.get(`${side}${n}`)!;
    const l = side === 'Left' ? 'l' : 'r';
    out.push(
      { shape: { kind: 'ellipsoid', c: m([0.062, 1.565, 0.058]), r: [0.056, 0.056, 0.05] }, bones: ['Head'], region: 'cheeks' }, // prettier-ignore
      { shape: { kind: 'ellipsoid', c: m([0.097, 1.6, 0.0]), r: [0.016, 0.032, 0.022] }, bones: ['Head'] }, // prettier-ignore
      { shape: { kind: 'ellipsoid', c: m([0.075, 1.255, 0.1]), r: [0.085, 0.08, 0.07] }, bones: ['Spine2', 'Spine1'], region: 'chest', facing: front }, // prettier-ignore
      { shape: { kind: 'ellipsoid', c: m([0.085, 0.89, -0.085]), r: [0.11, 0.12, 0.09] }, bones: ['Hips', `${side}UpLeg`], region: 'glutes', facing: [0, 0, -1] }, // prettier-ignore
      { shape: { kind: 'cone', a: g('Arm'), b: g('ForeArm'), ra: 0.078, rb: 0.054 }, bones: [`${side}Shoulder`, `${side}Arm`, `${side}ForeArm`], region: `upper_arm_${l}` }, // prettier-ignore
      { shape: { kind: 'cone', a: g('ForeArm'), b: g('Hand'), ra: 0.048, rb: 0.036 }, bones: [`${side}Arm`, `${side}ForeArm`, `${side}Hand`] }, // prettier-ignore
      { shape: { kind: 'cone', a: lerp3(g('ForeArm'), g('Hand'), 0.98), b: m([0.68, 0.955, 0.04]), ra: 0.042, rb: 0.038 }, bones: [`${side}ForeArm`, `${side}Hand`] }, // prettier-ignore
      { shape: { kind: 'cone', a: m([0.13, 0.86, 0.0]), b: g('Leg'), ra: 0.122, rb: 0.075 }, bones: ['Hips', `${side}UpLeg`, `${side}Leg`], region: `thigh_${l}` }, // prettier-ignore
      { shape: { kind: 'cone', a: g('Leg'), b: g('Foot'), ra: 0.072, rb: 0.045 }, bones: [`${side}UpLeg`, `${side}Leg`, `${side}Foot`] }, // prettier-ignore
      { shape: { kind: 'cone', a: m([0.14, 0.075, -0.02]), b: m([0.14, 0.035, 0.16]), ra: 0.048, rb: 0.035 }, bones: [`${side}Leg`, `${side}Foot`, `${side}ToeBase`] }, // prettier-ignore
    );
  }
  return out;
}

/** The stout coach. */
export function coachPlan(cell = 0.03): BodyPlan {
  const js = joints();
  const at = new Map(js.map((x) => [x.name, x.at]));
  return {
    id: 'coach-madge',
    title: 'Coach Madge Brackwater',
    description:
      'Stout swimming coach of the (invented) Saltmarrow Lido: short, broad, round belly, heavy upper arms.',
    namingConvention: 'PascalCase with Left/Right prefix (Hips, Spine1, LeftUpLeg, RightForeArm)',
    joints: js,
    parts: parts(at),
    regions: ['body', 'belly', 'chest', 'upper_arm_l', 'upper_arm_r', 'thigh_l', 'thigh_r', 'glutes', 'cheeks'], // prettier-ignore
    roles: {
      hips: 'Hips',
      spine: ['Spine', 'Spine1', 'Spine2'],
      neck: 'Neck',
      head: 'Head',
      arms: {
        l: { base: 'LeftShoulder', upper: 'LeftArm', lower: 'LeftForeArm', end: 'LeftHand' },
        r: { base: 'RightShoulder', upper: 'RightArm', lower: 'RightForeArm', end: 'RightHand' },
      },
      legs: {
        l: { upper: 'LeftUpLeg', lower: 'LeftLeg', end: 'LeftFoot', tip: 'LeftToeBase' },
        r: { upper: 'RightUpLeg', lower: 'RightLeg', end: 'RightFoot', tip: 'RightToeBase' },
      },
    },
    cell,
    blend: 0.016,
    weightSoftness: 0.032,
    regionSoftness: 0.012,
  };
}
