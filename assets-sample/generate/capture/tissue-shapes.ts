// Rest-space displacement fields of the known tissue. Each field is confined to its region: it
// fades to zero where the region's soft membership falls to one half, which lies inside the
// region's labelled vertices. Mode shapes are made orthogonal to the span of the corrective shapes
// so that dynamic and pose-driven motion can be told apart, then scaled to a peak of 1.
import { boneSegments, segmentClosest, smoothstep } from '../body/build-character.js';
import type { BuiltCharacter } from '../body/build-character.js';
import type { ShapeSpec, TissueSpec } from './tissue-spec.js';

/** Displacement fields (3N each, rest space, metres per unit coefficient). */
export interface TissueShapes {
  modeShapes: Float64Array[];
  correctiveShapes: Float64Array[];
}

interface Placement {
  region: string;
  /** Joint whose bone localises the field. */
  bone: string;
  /** Where along the bone the field peaks (undefined: along the whole bone). */
  along?: number;
}

function field(built: BuiltCharacter, place: Placement, shape: ShapeSpec): Float64Array {
  const { plan, character, regionSoft } = built;
  const n = character.restPositions.length / 3;
  const regionCount = plan.regions.length;
  const r = plan.regions.indexOf(place.region);
  const j = plan.joints.findIndex((x) => x.name === place.bone);
  if (r < 0 || j < 0) throw new Error(`${plan.id}: unknown region ${place.region} or bone ${place.bone}`); // prettier-ignore
  const [a, b] = boneSegments(plan)[j];
  const p = character.restPositions;
  const nrm = character.restNormals;
  const out = new Float64Array(3 * n);
  const dist = new Float64Array(n);
  let maxDist = 0;
  for (let v = 0; v < n; v++) {
    if (regionSoft[v * regionCount + r] <= 0.5) continue;
    const [d] = segmentClosest(a, b, p[3 * v], p[3 * v + 1], p[3 * v + 2]);
    dist[v] = d;
    maxDist = Math.max(maxDist, d);
  }
  for (let v = 0; v < n; v++) {
    const soft = regionSoft[v * regionCount + r];
    if (soft <= 0.5) continue;
    let w = smoothstep(0.5, 0.9, soft);
    const nx = nrm[3 * v], ny = nrm[3 * v + 1], nz = nrm[3 * v + 2]; // prettier-ignore
    if (shape.favour) {
      const f = shape.favour;
      w *= 0.2 + 0.8 * Math.max(0, nx * f[0] + ny * f[1] + nz * f[2]);
    }
    if (shape.fromBone) w *= 0.3 + 0.7 * (dist[v] / maxDist) ** 2;
    if (place.along !== undefined) {
      const [, t] = segmentClosest(a, b, p[3 * v], p[3 * v + 1], p[3 * v + 2]);
      w *= Math.exp(-(((t - place.along) / 0.3) ** 2));
    }
    const d = shape.direction;
    out[3 * v] = w * (d[0] + shape.normalWeight * nx);
    out[3 * v + 1] = w * (d[1] + shape.normalWeight * ny);
    out[3 * v + 2] = w * (d[2] + shape.normalWeight * nz);
  }
  return out;
}

function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}

/** Scales v so that its largest vertex displacement is `peak`. */
function scaleToPeak(v: Float64Array, peak: number): Float64Array {
  let max = 0;
  for (let i = 0; i < v.length; i += 3) max = Math.max(max, Math.hypot(v[i], v[i + 1], v[i + 2]));
  if (max === 0) throw new Error('a tissue shape has no displacement: is its region empty?');
  for (let i = 0; i < v.length; i++) v[i] *= peak / max;
  return v;
}

/** Builds the mode and corrective shapes of `spec` on a character. */
export function buildTissueShapes(built: BuiltCharacter, spec: TissueSpec): TissueShapes {
  const correctiveShapes = spec.correctives.map(
    (c) =>
    scaleToPeak(field(built, { region: c.region, bone: c.bone, along: c.along }, c.shape), c.amplitude), // prettier-ignore
  );
  // Orthonormal basis of the corrective span (Gram–Schmidt), to project it out of the modes.
  const basis: Float64Array[] = [];
  for (const c of correctiveShapes) {
    const e = Float64Array.from(c);
    for (const b of basis) {
      const k = dot(e, b);
      for (let i = 0; i < e.length; i++) e[i] -= k * b[i];
    }
    const len = Math.sqrt(dot(e, e));
    for (let i = 0; i < e.length; i++) e[i] /= len;
    basis.push(e);
  }
  const modeShapes = spec.modes.map((m) => {
    const v = field(built, { region: m.region, bone: m.driver }, m.shape);
    for (const b of basis) {
      const k = dot(v, b);
      for (let i = 0; i < v.length; i++) v[i] -= k * b[i];
    }
    return scaleToPeak(v, 1);
  });
  return { modeShapes, correctiveShapes };
}
