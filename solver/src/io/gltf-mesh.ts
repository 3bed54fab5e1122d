// Merging the triangle primitives of one glTF mesh into flat arrays (positions, triangles,
// skin sets, region labels), keeping each primitive's vertex range for morph targets.
import type { Mesh, Primitive } from '@gltf-transform/core';
import { SolverInputError } from '../errors.js';
import { accessorFloats, accessorIntegers, assertFinite } from './gltf-accessors.js';

const TRIANGLES = 4;

/** Merged geometry of a mesh. */
export interface MeshGeometry {
  /** Triangle primitives used, in order. */
  primitives: Primitive[];
  /** First vertex of each used primitive in the merged arrays. */
  vertexOffsets: number[];
  /** Merged positions (3N). */
  positions: Float32Array;
  /** Merged normals (3N) or null when any primitive lacks them. */
  normals: Float32Array | null;
  /** Merged triangles (3F). */
  triangles: Uint32Array;
  /** JOINTS_n sets (4N each), only sets present on every primitive. */
  jointSets: Uint32Array[];
  /** WEIGHTS_n sets (4N each), paired with jointSets. */
  weightSets: Float32Array[];
  /** `_REGION` values (N) or null. */
  regionValues: Float32Array | null;
}

/** Total vertex count of the triangle primitives of a mesh. */
export function meshVertexCount(mesh: Mesh): number {
  let n = 0;
  for (const p of mesh.listPrimitives()) {
    if (p.getMode() === TRIANGLES) n += p.getAttribute('POSITION')?.getCount() ?? 0;
  }
  return n;
}

/** Reads and merges the triangle primitives of `mesh`; warns about skipped primitives. */
export function readMeshGeometry(mesh: Mesh, warnings: string[]): MeshGeometry {
  const meshName = mesh.getName() || 'mesh';
  const primitives = mesh.listPrimitives().filter((p, k) => {
    if (p.getMode() !== TRIANGLES) {
      warnings.push(`${meshName}: primitive ${k} is not triangles and was skipped`);
      return false;
    }
    if (!p.getAttribute('POSITION')) {
      warnings.push(`${meshName}: primitive ${k} has no POSITION and was skipped`);
      return false;
    }
    return true;
  });
  if (primitives.length === 0) {
    throw new SolverInputError('UNSUPPORTED_INPUT', `${meshName} has no triangle primitives`, {
      item: meshName,
    });
  }
  const vertexOffsets: number[] = [];
  let n = 0;
  let f = 0;
  primitives.forEach((p, k) => {
    vertexOffsets.push(n);
    const count = p.getAttribute('POSITION')!.getCount();
    checkAttributeCounts(p, count, `${meshName} primitive ${k}`);
    n += count;
    f += p.getIndices()?.getCount() ?? count;
  });
  const positions = new Float32Array(3 * n);
  const triangles = new Uint32Array(f - (f % 3));
  const hasNormals = primitives.every((p) => p.getAttribute('NORMAL'));
  const normals = hasNormals ? new Float32Array(3 * n) : null;
  const setCount = countSets(primitives);
  const jointSets = Array.from({ length: setCount }, () => new Uint32Array(4 * n));
  const weightSets = Array.from({ length: setCount }, () => new Float32Array(4 * n));
  const hasRegions = primitives.every((p) => p.getAttribute('_REGION'));
  const regionValues = hasRegions ? new Float32Array(n) : null;
  let t = 0;
  primitives.forEach((p, k) => {
    const base = vertexOffsets[k];
    const pos = accessorFloats(p.getAttribute('POSITION')!);
    assertFinite(pos, 3, (v) => ({
      message: `${meshName}: position of vertex ${base + v} is not finite`,
      where: { vertex: base + v },
    }));
    positions.set(pos, 3 * base);
    if (normals) normals.set(accessorFloats(p.getAttribute('NORMAL')!), 3 * base);
    for (let s = 0; s < setCount; s++) {
      jointSets[s].set(accessorIntegers(p.getAttribute(`JOINTS_${s}`)!), 4 * base);
      weightSets[s].set(accessorFloats(p.getAttribute(`WEIGHTS_${s}`)!), 4 * base);
    }
    if (regionValues) regionValues.set(accessorFloats(p.getAttribute('_REGION')!), base);
    const count = pos.length / 3;
    const indices = p.getIndices();
    const idx = indices ? accessorIntegers(indices) : null;
    const m = idx ? idx.length - (idx.length % 3) : count - (count % 3);
    for (let i = 0; i < m; i++) {
      const v = idx ? idx[i] : i;
      if (v >= count) {
        throw new SolverInputError(
          'VERTEX_COUNT_MISMATCH',
          `${meshName}: triangle index ${v} is past the ${count} vertices of primitive ${k}`,
          { vertex: v, item: `${meshName} primitive ${k}` },
        );
      }
      triangles[t++] = base + v;
    }
  });
  return {
    primitives,
    vertexOffsets,
    positions,
    normals,
    triangles: t === triangles.length ? triangles : triangles.slice(0, t),
    jointSets,
    weightSets,
    regionValues,
  };
}

/** Every vertex attribute must have one element per position (VERTEX_COUNT_MISMATCH otherwise). */
function checkAttributeCounts(p: Primitive, count: number, where: string): void {
  for (const semantic of p.listSemantics()) {
    const n = p.getAttribute(semantic)!.getCount();
    if (n !== count) {
      throw new SolverInputError(
        'VERTEX_COUNT_MISMATCH',
        `${where}: ${semantic} has ${n} elements but POSITION has ${count}`,
        { item: `${where}: ${semantic}` },
      );
    }
  }
}

/** Number of JOINTS_n/WEIGHTS_n pairs present on every primitive. */
function countSets(primitives: Primitive[]): number {
  let s = 0;
  while (primitives.every((p) => p.getAttribute(`JOINTS_${s}`) && p.getAttribute(`WEIGHTS_${s}`))) {
    s++;
  }
  return s;
}

/** Area-weighted vertex normals of a triangle mesh (zero-area fans give (0, 0, 0)). */
export function computeNormals(positions: Float32Array, triangles: Uint32Array): Float32Array {
  const out = new Float32Array(positions.length);
  for (let t = 0; t < triangles.length; t += 3) {
    const a = 3 * triangles[t], b = 3 * triangles[t + 1], c = 3 * triangles[t + 2]; // prettier-ignore
    const ux = positions[b] - positions[a];
    const uy = positions[b + 1] - positions[a + 1];
    const uz = positions[b + 2] - positions[a + 2];
    const vx = positions[c] - positions[a];
    const vy = positions[c + 1] - positions[a + 1];
    const vz = positions[c + 2] - positions[a + 2];
    const nx = uy * vz - uz * vy;
    const ny = uz * vx - ux * vz;
    const nz = ux * vy - uy * vx;
    for (const v of [a, b, c]) {
      out[v] += nx;
      out[v + 1] += ny;
      out[v + 2] += nz;
    }
  }
  for (let i = 0; i < out.length; i += 3) {
    const len = Math.hypot(out[i], out[i + 1], out[i + 2]);
    if (len > 0) {
      out[i] /= len;
      out[i + 1] /= len;
      out[i + 2] /= len;
    }
  }
  return out;
}
