// Otto Spindlewick (invented): the lanky young swimmer of the Saltmarrow Lido. Tall and lean,
// long arms, broad shoulders, big hands and feet. Meshed at about 15,000 triangles, a usual
// full-body template resolution (common practice). Joints are snake_case with an _l/_r suffix
// ("thigh_l").
import { mirror, type BodyPlan, type JointSpec, type PartSpec } from './body-plan.js';
import type { Vec3 } from './sdf.js';

const SIDES = [
  ['l', 1],
  ['r', -1],
] as const;

function joints(): JointSpec[] {
  const out: JointSpec[] = [
    { name: 'pelvis', parent: null, at: [0, 1.06, 0] },
    { name: 'spine_01', parent: 'pelvis', at: [0, 1.16, 0.0] },
    { name: 'spine_02', parent: 'spine_01', at: [0, 1.3, -0.005] },
    { name: 'spine_03', parent: 'spine_02', at: [0, 1.44, -0.01] },
    { name: 'neck_01', parent: 'spine_03', at: [0, 1.62, -0.015] },
    { name: 'head', parent: 'neck_01', at: [0, 1.71, -0.005], tip: [0, 1.93, 0.0] },
  ];
  for (const [l, s] of SIDES) {
    const m = (p: Vec3): Vec3 => (s > 0 ? p : mirror(p));
    out.push(
      { name: `clavicle_${l}`, parent: 'spine_03', at: m([0.035, 1.565, 0.0]) },
      { name: `upperarm_${l}`, parent: `clavicle_${l}`, at: m([0.205, 1.56, -0.015]) },
      { name: `lowerarm_${l}`, parent: `upperarm_${l}`, at: m([0.45, 1.33, -0.02]) },
      { name: `hand_${l}`, parent: `lowerarm_${l}`, at: m([0.665, 1.125, 0.0]), tip: m([0.8, 0.995, 0.015]) }, // prettier-ignore
    );
  }
  for (const [l, s] of SIDES) {
    const m = (p: Vec3): Vec3 => (s > 0 ? p : mirror(p));
    out.push(
      { name: `thigh_${l}`, parent: 'pelvis', at: m([0.095, 1.0, 0.0]) },
      { name: `calf_${l}`, parent: `thigh_${l}`, at: m([0.105, 0.545, 0.01]) },
      { name: `foot_${l}`, parent: `calf_${l}`, at: m([0.11, 0.09, -0.025]) },
      { name: `ball_${l}`, parent: `foot_${l}`, at: m([0.115, 0.025, 0.135]), tip: m([0.12, 0.025, 0.21]) }, // prettier-ignore
    );
  }
  return out;
}

function parts(j: Map<string, Vec3>): PartSpec[] {
  const front: Vec3 = [0, 0, 1];
  const out: PartSpec[] = [
    { shape: { kind: 'ellipsoid', c: [0, 1.04, -0.005], r: [0.15, 0.105, 0.1] }, bones: ['pelvis', 'spine_01'] }, // prettier-ignore
    { shape: { kind: 'cone', a: [0, 1.08, -0.01], b: [0, 1.4, -0.01], ra: 0.105, rb: 0.12 }, bones: ['pelvis', 'spine_01', 'spine_02', 'spine_03'] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.2, 0.015], r: [0.135, 0.15, 0.095] }, bones: ['pelvis', 'spine_01', 'spine_02'], region: 'belly', facing: front }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.42, 0.0], r: [0.165, 0.15, 0.11] }, bones: ['spine_02', 'spine_03'], region: 'chest', facing: front }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.47, -0.025], r: [0.205, 0.12, 0.09] }, bones: ['spine_02', 'spine_03', 'clavicle_l', 'clavicle_r'] }, // prettier-ignore
    { shape: { kind: 'cone', a: [-0.215, 1.545, -0.02], b: [0.215, 1.545, -0.02], ra: 0.058, rb: 0.058 }, bones: ['spine_03', 'clavicle_l', 'clavicle_r', 'upperarm_l', 'upperarm_r'] }, // prettier-ignore
    { shape: { kind: 'cone', a: [0, 1.55, -0.015], b: [0, 1.74, -0.005], ra: 0.052, rb: 0.047 }, bones: ['spine_03', 'neck_01', 'head'] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.8, 0.005], r: [0.085, 0.113, 0.1] }, bones: ['head'] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.725, 0.045], r: [0.055, 0.04, 0.05] }, bones: ['head'], region: 'cheeks' }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.79, 0.105], r: [0.016, 0.032, 0.022] }, bones: ['head'] }, // prettier-ignore
  ];
  for (const [l, s] of SIDES) {
    const m = (p: Vec3): Vec3 => (s > 0 ? p : mirror(p));
    const g = (n: string) => j.get(`${n}_${l}`)!;
    out.push(
      { shape: { kind: 'ellipsoid', c: m([0.082, 1.8, 0.0]), r: [0.014, 0.03, 0.02] }, bones: ['head'] }, // prettier-ignore
      { shape: { kind: 'ellipsoid', c: m([0.07, 1.0, -0.06]), r: [0.085, 0.095, 0.07] }, bones: ['pelvis', `thigh_${l}`], region: 'glutes', facing: [0, 0, -1] }, // prettier-ignore
      { shape: { kind: 'ellipsoid', c: m([0.08, 1.43, 0.06]), r: [0.085, 0.07, 0.05] }, bones: ['spine_03', 'spine_02'], region: 'chest', facing: front }, // prettier-ignore
      { shape: { kind: 'cone', a: g('upperarm'), b: g('lowerarm'), ra: 0.053, rb: 0.04 }, bones: [`clavicle_${l}`, `upperarm_${l}`, `lowerarm_${l}`], region: `upper_arm_${l}` }, // prettier-ignore
      { shape: { kind: 'cone', a: g('lowerarm'), b: g('hand'), ra: 0.04, rb: 0.029 }, bones: [`upperarm_${l}`, `lowerarm_${l}`, `hand_${l}`] }, // prettier-ignore
      { shape: { kind: 'cone', a: g('hand'), b: m([0.78, 1.01, 0.015]), ra: 0.033, rb: 0.027 }, bones: [`lowerarm_${l}`, `hand_${l}`] }, // prettier-ignore
      { shape: { kind: 'cone', a: m([0.095, 0.98, 0.0]), b: g('calf'), ra: 0.082, rb: 0.052 }, bones: ['pelvis', `thigh_${l}`, `calf_${l}`], region: `thigh_${l}` }, // prettier-ignore
      { shape: { kind: 'cone', a: g('calf'), b: g('foot'), ra: 0.054, rb: 0.034 }, bones: [`thigh_${l}`, `calf_${l}`, `foot_${l}`], region: `calf_${l}` }, // prettier-ignore
      { shape: { kind: 'cone', a: m([0.11, 0.075, -0.035]), b: m([0.12, 0.03, 0.2]), ra: 0.042, rb: 0.028 }, bones: [`calf_${l}`, `foot_${l}`, `ball_${l}`] }, // prettier-ignore
    );
  }
  return out;
}

/** The lanky swimmer (about 15,000 triangles). */
export function swimmerPlan(cell = 0.019): BodyPlan {
  const js = joints();
  const at = new Map(js.map((x) => [x.name, x.at]));
  return {
    id: 'swimmer-otto',
    title: 'Otto Spindlewick',
    description:
      'Lanky young swimmer of the (invented) Saltmarrow Lido: tall, lean, long limbs, big hands and feet.',
    namingConvention: 'snake_case with _l/_r suffix (pelvis, spine_02, thigh_l, lowerarm_r)',
    joints: js,
    parts: parts(at),
    regions: ['body', 'belly', 'chest', 'upper_arm_l', 'upper_arm_r', 'thigh_l', 'thigh_r', 'calf_l', 'calf_r', 'glutes', 'cheeks'], // prettier-ignore
    roles: {
      hips: 'pelvis',
      spine: ['spine_01', 'spine_02', 'spine_03'],
      neck: 'neck_01',
      head: 'head',
      arms: {
        l: { base: 'clavicle_l', upper: 'upperarm_l', lower: 'lowerarm_l', end: 'hand_l' },
        r: { base: 'clavicle_r', upper: 'upperarm_r', lower: 'lowerarm_r', end: 'hand_r' },
      },
      legs: {
        l: { upper: 'thigh_l', lower: 'calf_l', end: 'foot_l', tip: 'ball_l' },
        r: { upper: 'thigh_r', lower: 'calf_r', end: 'foot_r', tip: 'ball_r' },
      },
    },
    cell,
    blend: 0.012,
    weightSoftness: 0.022,
    regionSoftness: 0.01,
  };
}
