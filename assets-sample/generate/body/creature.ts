// Old Grumbletusk (invented): the walrus-like mascot creature of the Saltmarrow Lido. A huge
// round body on short hind flippers, front flippers, tusks and a whiskered muzzle. Joints use a
// dotted lowercase convention with .L/.R suffixes ("flipper_upper.L").
import { mirror, type BodyPlan, type JointSpec, type PartSpec } from './body-plan.js';
import type { Vec3 } from './sdf.js';

const SIDES = [
  ['L', 1],
  ['R', -1],
] as const;

function joints(): JointSpec[] {
  const out: JointSpec[] = [
    { name: 'root', parent: null, at: [0, 0.55, 0] },
    { name: 'spine.001', parent: 'root', at: [0, 0.76, 0] },
    { name: 'spine.002', parent: 'spine.001', at: [0, 0.96, 0.01] },
    { name: 'spine.003', parent: 'spine.002', at: [0, 1.12, 0.03] },
    { name: 'neck', parent: 'spine.003', at: [0, 1.26, 0.06] },
    { name: 'head', parent: 'neck', at: [0, 1.38, 0.1], tip: [0, 1.5, 0.3] },
    { name: 'jaw', parent: 'head', at: [0, 1.33, 0.22], tip: [0, 1.22, 0.32] },
  ];
  for (const [x, s] of SIDES) {
    const m = (p: Vec3): Vec3 => (s > 0 ? p : mirror(p));
    out.push(
      { name: `shoulder.${x}`, parent: 'spine.003', at: m([0.12, 1.06, 0.05]) },
      { name: `flipper_upper.${x}`, parent: `shoulder.${x}`, at: m([0.33, 1.02, 0.07]) },
      { name: `flipper_lower.${x}`, parent: `flipper_upper.${x}`, at: m([0.47, 0.88, 0.1]) },
      { name: `flipper_hand.${x}`, parent: `flipper_lower.${x}`, at: m([0.57, 0.76, 0.13]), tip: m([0.67, 0.64, 0.17]) }, // prettier-ignore
    );
  }
  for (const [x, s] of SIDES) {
    const m = (p: Vec3): Vec3 => (s > 0 ? p : mirror(p));
    out.push(
      { name: `hindflipper_upper.${x}`, parent: 'root', at: m([0.17, 0.48, 0.0]) },
      { name: `hindflipper_lower.${x}`, parent: `hindflipper_upper.${x}`, at: m([0.2, 0.27, 0.03]) }, // prettier-ignore
      { name: `hindflipper_foot.${x}`, parent: `hindflipper_lower.${x}`, at: m([0.21, 0.09, 0.02]), tip: m([0.23, 0.03, 0.25]) }, // prettier-ignore
    );
  }
  return out;
}

function parts(j: Map<string, Vec3>): PartSpec[] {
  const out: PartSpec[] = [
    { shape: { kind: 'ellipsoid', c: [0, 0.72, 0], r: [0.42, 0.42, 0.38] }, bones: ['root', 'spine.001', 'spine.002'], region: 'belly', facing: [0, -0.2, 1] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.05, 0.02], r: [0.34, 0.27, 0.3] }, bones: ['spine.002', 'spine.003', 'shoulder.L', 'shoulder.R'], region: 'back_blubber', facing: [0, 0.3, -1] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.22, 0.15], r: [0.27, 0.1, 0.21] }, bones: ['spine.003', 'neck', 'head'], region: 'neck_fold', facing: [0, -0.3, 1] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.42, 0.16], r: [0.19, 0.16, 0.18] }, bones: ['neck', 'head'] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 1.43, 0.3], r: [0.075, 0.05, 0.07] }, bones: ['head'] }, // prettier-ignore
    { shape: { kind: 'ellipsoid', c: [0, 0.4, -0.3], r: [0.17, 0.1, 0.14] }, bones: ['root'] }, // prettier-ignore
  ];
  for (const [x, s] of SIDES) {
    const m = (p: Vec3): Vec3 => (s > 0 ? p : mirror(p));
    const g = (n: string) => j.get(`${n}.${x}`)!;
    const l = x.toLowerCase();
    out.push(
      { shape: { kind: 'ellipsoid', c: m([0.072, 1.36, 0.31]), r: [0.09, 0.08, 0.08] }, bones: ['head', 'jaw'], region: 'whisker_pad' }, // prettier-ignore
      { shape: { kind: 'ellipsoid', c: m([0.095, 1.5, 0.27]), r: [0.032, 0.032, 0.028] }, bones: ['head'] }, // prettier-ignore
      { shape: { kind: 'cone', a: m([0.06, 1.32, 0.36]), b: m([0.07, 1.05, 0.39]), ra: 0.027, rb: 0.016 }, bones: ['jaw'] }, // prettier-ignore
      { shape: { kind: 'cone', a: g('flipper_upper'), b: g('flipper_lower'), ra: 0.088, rb: 0.066 }, bones: [`shoulder.${x}`, `flipper_upper.${x}`, `flipper_lower.${x}`], region: `flipper_${l}` }, // prettier-ignore
      { shape: { kind: 'cone', a: g('flipper_lower'), b: g('flipper_hand'), ra: 0.064, rb: 0.05 }, bones: [`flipper_upper.${x}`, `flipper_lower.${x}`, `flipper_hand.${x}`] }, // prettier-ignore
      { shape: { kind: 'cone', a: g('flipper_hand'), b: m([0.66, 0.65, 0.15]), ra: 0.05, rb: 0.034 }, bones: [`flipper_lower.${x}`, `flipper_hand.${x}`] }, // prettier-ignore
      { shape: { kind: 'cone', a: g('flipper_hand'), b: m([0.62, 0.63, 0.22]), ra: 0.046, rb: 0.03 }, bones: [`flipper_lower.${x}`, `flipper_hand.${x}`] }, // prettier-ignore
      { shape: { kind: 'cone', a: m([0.17, 0.5, 0.0]), b: g('hindflipper_lower'), ra: 0.125, rb: 0.085 }, bones: ['root', `hindflipper_upper.${x}`, `hindflipper_lower.${x}`], region: `haunch_${l}` }, // prettier-ignore
      { shape: { kind: 'cone', a: g('hindflipper_lower'), b: g('hindflipper_foot'), ra: 0.08, rb: 0.06 }, bones: [`hindflipper_upper.${x}`, `hindflipper_lower.${x}`, `hindflipper_foot.${x}`] }, // prettier-ignore
      { shape: { kind: 'cone', a: g('hindflipper_foot'), b: m([0.29, 0.03, 0.24]), ra: 0.06, rb: 0.03 }, bones: [`hindflipper_lower.${x}`, `hindflipper_foot.${x}`] }, // prettier-ignore
      { shape: { kind: 'cone', a: g('hindflipper_foot'), b: m([0.15, 0.03, 0.25]), ra: 0.055, rb: 0.03 }, bones: [`hindflipper_lower.${x}`, `hindflipper_foot.${x}`] }, // prettier-ignore
    );
  }
  return out;
}

/** The walrus-like creature. */
export function creaturePlan(cell = 0.03): BodyPlan {
  const js = joints();
  const at = new Map(js.map((x) => [x.name, x.at]));
  return {
    id: 'creature-grumbletusk',
    title: 'Old Grumbletusk',
    description:
      'Walrus-like mascot creature of the (invented) Saltmarrow Lido: a huge round body, short hind flippers, tusks.',
    namingConvention: 'lowercase, dotted numbering and .L/.R suffix (spine.002, flipper_upper.L)',
    joints: js,
    parts: parts(at),
    regions: ['body', 'belly', 'back_blubber', 'neck_fold', 'whisker_pad', 'flipper_l', 'flipper_r', 'haunch_l', 'haunch_r'], // prettier-ignore
    roles: {
      hips: 'root',
      spine: ['spine.001', 'spine.002', 'spine.003'],
      neck: 'neck',
      head: 'head',
      jaw: 'jaw',
      arms: {
        l: { base: 'shoulder.L', upper: 'flipper_upper.L', lower: 'flipper_lower.L', end: 'flipper_hand.L' }, // prettier-ignore
        r: { base: 'shoulder.R', upper: 'flipper_upper.R', lower: 'flipper_lower.R', end: 'flipper_hand.R' }, // prettier-ignore
      },
      legs: {
        l: {
          upper: 'hindflipper_upper.L',
          lower: 'hindflipper_lower.L',
          end: 'hindflipper_foot.L',
        },
        r: {
          upper: 'hindflipper_upper.R',
          lower: 'hindflipper_lower.R',
          end: 'hindflipper_foot.R',
        },
      },
    },
    cell,
    blend: 0.02,
    weightSoftness: 0.04,
    regionSoftness: 0.015,
  };
}
