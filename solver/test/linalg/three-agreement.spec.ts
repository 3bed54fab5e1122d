// Quaternion and matrix conversions checked against three.js (three 0.187.0, src/math), a
// widely used reference implementation of the same algebra.
import { Matrix4, Quaternion, Vector3 } from 'three';
import { describe, expect, it } from 'vitest';
import {
  mat4Compose,
  mat4Invert,
  mat4Multiply,
  mat4TransformPoint,
  quatFromAxisAngle,
  quatFromMat4,
  quatMultiply,
  quatRotateVec3,
  quatSlerp,
} from '../../src/index.js';
import { randomQuat, seededRandom } from '../helpers/random.js';

const rand = seededRandom(7);
const q3 = (q: number[]) => new Quaternion(q[0], q[1], q[2], q[3]);
const sameRotation = (a: ArrayLike<number>, b: Quaternion) => {
  // q and −q are the same rotation.
  const dot = a[0] * b.x + a[1] * b.y + a[2] * b.z + a[3] * b.w;
  return Math.abs(Math.abs(dot) - 1);
};

describe('quaternions agree with three.js', () => {
  it('multiplies like Quaternion.multiplyQuaternions', () => {
    for (let i = 0; i < 50; i++) {
      const a = randomQuat(rand, Math.PI);
      const b = randomQuat(rand, Math.PI);
      const ours = quatMultiply(new Float64Array(4), 0, a, 0, b, 0);
      const ref = new Quaternion().multiplyQuaternions(q3(a), q3(b));
      expect(Array.from(ours)).toEqual(ref.toArray().map((v) => expect.closeTo(v, 12)));
    }
  });

  it('builds axis-angle rotations like Quaternion.setFromAxisAngle', () => {
    const axis = new Vector3(1, 2, -0.5).normalize();
    const ours = quatFromAxisAngle(new Float64Array(4), 0, axis.x, axis.y, axis.z, 1.234);
    const ref = new Quaternion().setFromAxisAngle(axis, 1.234);
    expect(sameRotation(ours, ref)).toBeLessThan(1e-12);
  });

  it('rotates vectors like Vector3.applyQuaternion', () => {
    for (let i = 0; i < 50; i++) {
      const q = randomQuat(rand, Math.PI);
      const v = [rand() - 0.5, rand() * 2, rand() - 0.3];
      const ours = quatRotateVec3(new Float64Array(3), 0, q, 0, v, 0);
      const ref = new Vector3(v[0], v[1], v[2]).applyQuaternion(q3(q));
      expect(Math.hypot(ours[0] - ref.x, ours[1] - ref.y, ours[2] - ref.z)).toBeLessThan(1e-12);
    }
  });

  it('extracts rotations like Quaternion.setFromRotationMatrix, also from scaled matrices', () => {
    for (let i = 0; i < 100; i++) {
      const q = randomQuat(rand, Math.PI);
      const s = new Vector3(0.5 + rand(), 0.5 + rand(), 0.5 + rand());
      const m = new Matrix4().compose(new Vector3(1, 2, 3), q3(q), s);
      const ours = quatFromMat4(new Float64Array(4), 0, m.elements, 0);
      const ref = new Quaternion().setFromRotationMatrix(new Matrix4().extractRotation(m));
      expect(sameRotation(ours, ref)).toBeLessThan(1e-10);
    }
  });

  it('interpolates like Quaternion.slerp', () => {
    for (let i = 0; i < 50; i++) {
      const a = randomQuat(rand, Math.PI);
      const b = randomQuat(rand, Math.PI);
      const t = rand();
      const ours = quatSlerp(new Float64Array(4), 0, a, 0, b, 0, t);
      const ref = q3(a).slerp(q3(b), t);
      expect(sameRotation(ours, ref)).toBeLessThan(1e-9);
    }
  });
});

describe('matrices agree with three.js', () => {
  it('composes TRS like Matrix4.compose', () => {
    const q = randomQuat(rand, 2);
    const ours = mat4Compose(new Float64Array(16), 0, [1, -2, 3], 0, q, 0, [2, 0.5, 1.5], 0);
    const ref = new Matrix4().compose(new Vector3(1, -2, 3), q3(q), new Vector3(2, 0.5, 1.5));
    ref.elements.forEach((v, i) => expect(ours[i]).toBeCloseTo(v, 12));
  });

  it('multiplies like Matrix4.multiplyMatrices, also in place', () => {
    const a = new Matrix4().compose(
      new Vector3(1, 2, 3),
      q3(randomQuat(rand, 2)),
      new Vector3(1, 2, 1),
    );
    const b = new Matrix4().compose(
      new Vector3(-1, 0, 2),
      q3(randomQuat(rand, 2)),
      new Vector3(1, 1, 3),
    );
    const ref = new Matrix4().multiplyMatrices(a, b);
    const buf = new Float64Array(32);
    buf.set(a.elements, 0);
    buf.set(b.elements, 16);
    mat4Multiply(buf, 16, buf, 0, buf, 16);
    ref.elements.forEach((v, i) => expect(buf[16 + i]).toBeCloseTo(v, 12));
  });

  it('inverts like Matrix4.invert and transforms points like Vector3.applyMatrix4', () => {
    const m = new Matrix4().compose(
      new Vector3(0.3, 2, -1),
      q3(randomQuat(rand, 3)),
      new Vector3(0.7, 1.3, 2),
    );
    const ours = new Float64Array(16);
    expect(mat4Invert(ours, 0, m.elements, 0)).toBe(true);
    const ref = m.clone().invert();
    ref.elements.forEach((v, i) => expect(ours[i]).toBeCloseTo(v, 10));
    const p = mat4TransformPoint(new Float64Array(3), 0, ours, 0, [1, 2, 3], 0);
    const rp = new Vector3(1, 2, 3).applyMatrix4(ref);
    expect(Math.hypot(p[0] - rp.x, p[1] - rp.y, p[2] - rp.z)).toBeLessThan(1e-10);
  });

  it('reports a singular matrix instead of returning garbage', () => {
    const out = new Float64Array(16).fill(7);
    expect(mat4Invert(out, 0, new Float64Array(16), 0)).toBe(false);
    expect(Array.from(out).every((v) => v === 0)).toBe(true);
  });
});
