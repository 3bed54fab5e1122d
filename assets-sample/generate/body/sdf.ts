// Signed distance primitives for procedural bodies (negative inside), and their smooth union.
// Exact round-cone distance and the usual cheap ellipsoid bound (Quilez, "distance functions").

/** A point or vector in metres. */
export type Vec3 = readonly [number, number, number];

/** Two spheres joined by their tangent cone (a capsule when ra = rb). */
export interface RoundCone {
  kind: 'cone';
  a: Vec3;
  b: Vec3;
  ra: number;
  rb: number;
}

/** Axis-aligned ellipsoid. */
export interface Ellipsoid {
  kind: 'ellipsoid';
  c: Vec3;
  r: Vec3;
}

/** A body-part primitive. */
export type Shape = RoundCone | Ellipsoid;

/** Signed distance (metres) from (x, y, z) to a shape; exact for cones, a bound for ellipsoids. */
export function shapeDistance(s: Shape, x: number, y: number, z: number): number {
  return s.kind === 'cone' ? roundConeDistance(s, x, y, z) : ellipsoidDistance(s, x, y, z);
}

function roundConeDistance(s: RoundCone, x: number, y: number, z: number): number {
  const bax = s.b[0] - s.a[0], bay = s.b[1] - s.a[1], baz = s.b[2] - s.a[2]; // prettier-ignore
  const l2 = bax * bax + bay * bay + baz * baz;
  const rr = s.ra - s.rb;
  const a2 = l2 - rr * rr;
  const il2 = 1 / l2;
  const pax = x - s.a[0], pay = y - s.a[1], paz = z - s.a[2]; // prettier-ignore
  const py = pax * bax + pay * bay + paz * baz;
  const pz = py - l2;
  const qx = pax * l2 - bax * py, qy = pay * l2 - bay * py, qz = paz * l2 - baz * py; // prettier-ignore
  const x2 = qx * qx + qy * qy + qz * qz;
  const y2 = py * py * l2;
  const z2 = pz * pz * l2;
  const k = Math.sign(rr) * rr * rr * x2;
  if (Math.sign(pz) * a2 * z2 > k) return Math.sqrt(x2 + z2) * il2 - s.rb;
  if (Math.sign(py) * a2 * y2 < k) return Math.sqrt(x2 + y2) * il2 - s.ra;
  return (Math.sqrt(x2 * a2 * il2) + py * rr) * il2 - s.ra;
}

function ellipsoidDistance(s: Ellipsoid, x: number, y: number, z: number): number {
  const px = x - s.c[0], py = y - s.c[1], pz = z - s.c[2]; // prettier-ignore
  const ax = px / s.r[0], ay = py / s.r[1], az = pz / s.r[2]; // prettier-ignore
  const k0 = Math.sqrt(ax * ax + ay * ay + az * az);
  const bx = ax / s.r[0], by = ay / s.r[1], bz = az / s.r[2]; // prettier-ignore
  const k1 = Math.sqrt(bx * bx + by * by + bz * bz);
  // At the centre the bound is undefined; any negative value of the right size will do.
  if (k1 === 0) return -Math.min(s.r[0], s.r[1], s.r[2]);
  return (k0 * (k0 - 1)) / k1;
}

/** Centre of a shape (midpoint of a cone's axis). */
export function shapeCentre(s: Shape): Vec3 {
  if (s.kind === 'ellipsoid') return s.c;
  return [(s.a[0] + s.b[0]) / 2, (s.a[1] + s.b[1]) / 2, (s.a[2] + s.b[2]) / 2];
}

/** Axis-aligned bounds of a shape. */
export function shapeBounds(s: Shape): { min: Vec3; max: Vec3 } {
  if (s.kind === 'ellipsoid') {
    return {
      min: [s.c[0] - s.r[0], s.c[1] - s.r[1], s.c[2] - s.r[2]],
      max: [s.c[0] + s.r[0], s.c[1] + s.r[1], s.c[2] + s.r[2]],
    };
  }
  const min = [0, 1, 2].map((i) => Math.min(s.a[i] - s.ra, s.b[i] - s.rb)) as unknown as Vec3;
  const max = [0, 1, 2].map((i) => Math.max(s.a[i] + s.ra, s.b[i] + s.rb)) as unknown as Vec3;
  return { min, max };
}

/**
 * Smooth union of distances (exponential smooth minimum, blend radius `blend` metres):
 * −b·ln Σ exp(−dᵢ/b), computed around the smallest distance so it never overflows.
 */
export function smoothUnion(distances: ArrayLike<number>, blend: number): number {
  let m = Infinity;
  for (let i = 0; i < distances.length; i++) if (distances[i] < m) m = distances[i];
  let sum = 0;
  for (let i = 0; i < distances.length; i++) sum += Math.exp(-(distances[i] - m) / blend);
  return m - blend * Math.log(sum);
}

/**
 * Soft membership of a point in each shape: softmax of −dᵢ/τ into `out` (sums to 1). Smooth in
 * space, so weights and regions derived from it have no seams.
 */
export function softMembership(distances: ArrayLike<number>, tau: number, out: Float64Array): void {
  let m = Infinity;
  for (let i = 0; i < distances.length; i++) if (distances[i] < m) m = distances[i];
  let sum = 0;
  for (let i = 0; i < distances.length; i++) {
    out[i] = Math.exp(-(distances[i] - m) / tau);
    sum += out[i];
  }
  for (let i = 0; i < distances.length; i++) out[i] /= sum;
}
