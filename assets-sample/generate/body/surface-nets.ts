// Isosurface of a signed distance field as a closed triangle mesh: naive surface nets (one vertex
// per cell that the surface crosses, one quad per crossed grid edge), then each vertex is relaxed
// towards its neighbours and projected back onto the zero level set. Surface nets give evenly
// sized, well-shaped triangles without the 256-case tables of marching cubes.
import type { Vec3 } from './sdf.js';

/** A scalar field, negative inside. */
export type Field = (x: number, y: number, z: number) => number;

/** Options for meshing a field. */
export interface SurfaceNetsOptions {
  /** Grid spacing in metres (about the edge length of the result). */
  cell: number;
  /** Relax-and-project passes after extraction. */
  relaxPasses?: number;
}

/** An indexed triangle mesh (counter-clockwise seen from outside). */
export interface TriangleMesh {
  positions: Float64Array;
  triangles: Uint32Array;
}

/** Meshes the zero level set of `field` inside the box [min, max] (padded by two cells). */
export function surfaceNets(
  field: Field,
  min: Vec3,
  max: Vec3,
  options: SurfaceNetsOptions,
): TriangleMesh {
  const h = options.cell;
  const o = [min[0] - 2 * h, min[1] - 2 * h, min[2] - 2 * h];
  const n = [0, 1, 2].map((a) => Math.ceil((max[a] - min[a]) / h) + 5);
  const [nx, ny, nz] = n;
  const values = new Float64Array(nx * ny * nz);
  for (let k = 0, p = 0; k < nz; k++) {
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++, p++) values[p] = field(o[0] + i * h, o[1] + j * h, o[2] + k * h);
    }
  }
  const node = (i: number, j: number, k: number) => i + nx * (j + ny * k);
  const cx = nx - 1, cy = ny - 1; // prettier-ignore
  const cellIndex = new Int32Array(cx * cy * (nz - 1)).fill(-1);
  const verts: number[] = [];
  const corner = new Float64Array(8);
  for (let k = 0; k < nz - 1; k++) {
    for (let j = 0; j < cy; j++) {
      for (let i = 0; i < cx; i++) {
        let inside = 0;
        for (let c = 0; c < 8; c++) {
          corner[c] = values[node(i + (c & 1), j + ((c >> 1) & 1), k + ((c >> 2) & 1))];
          if (corner[c] < 0) inside++;
        }
        if (inside === 0 || inside === 8) continue;
        // Mean of the crossings on the cell's 12 edges (corner pairs differing in one bit).
        let sx = 0, sy = 0, sz = 0, count = 0; // prettier-ignore
        for (let c = 0; c < 8; c++) {
          for (let bit = 1; bit < 8; bit <<= 1) {
            const d = c | bit;
            if (d === c || corner[c] < 0 === corner[d] < 0) continue;
            const t = corner[c] / (corner[c] - corner[d]);
            sx += (c & 1) + ((d & 1) - (c & 1)) * t;
            sy += ((c >> 1) & 1) + (((d >> 1) & 1) - ((c >> 1) & 1)) * t;
            sz += ((c >> 2) & 1) + (((d >> 2) & 1) - ((c >> 2) & 1)) * t;
            count++;
          }
        }
        cellIndex[i + cx * (j + cy * k)] = verts.length / 3;
        verts.push(
          o[0] + (i + sx / count) * h,
          o[1] + (j + sy / count) * h,
          o[2] + (k + sz / count) * h,
        );
      }
    }
  }
  const cell = (i: number, j: number, k: number) => cellIndex[i + cx * (j + cy * k)];
  const tris: number[] = [];
  const quad = (a: number, b: number, c: number, d: number, flip: boolean) => {
    if (flip) [b, d] = [d, b];
    // Split along the shorter diagonal for better-shaped triangles.
    if (dist2(verts, a, c) <= dist2(verts, b, d)) tris.push(a, b, c, a, c, d);
    else tris.push(a, b, d, b, c, d);
  };
  for (let k = 1; k < nz - 1; k++) {
    for (let j = 1; j < ny - 1; j++) {
      for (let i = 1; i < nx - 1; i++) {
        const v = values[node(i, j, k)] < 0;
        // x-edge: quad in (y, z), outward +x when the lower node is inside.
        if (v !== values[node(i + 1, j, k)] < 0) {
          quad(cell(i, j - 1, k - 1), cell(i, j, k - 1), cell(i, j, k), cell(i, j - 1, k), !v);
        }
        if (v !== values[node(i, j + 1, k)] < 0) {
          quad(cell(i - 1, j, k - 1), cell(i - 1, j, k), cell(i, j, k), cell(i, j, k - 1), !v);
        }
        if (v !== values[node(i, j, k + 1)] < 0) {
          quad(cell(i - 1, j - 1, k), cell(i, j - 1, k), cell(i, j, k), cell(i - 1, j, k), !v);
        }
      }
    }
  }
  const positions = Float64Array.from(verts);
  const triangles = Uint32Array.from(tris);
  relaxAndProject(field, positions, triangles, options.relaxPasses ?? 2, h);
  return { positions, triangles };
}

function dist2(v: number[], a: number, b: number): number {
  const dx = v[3 * a] - v[3 * b], dy = v[3 * a + 1] - v[3 * b + 1], dz = v[3 * a + 2] - v[3 * b + 2]; // prettier-ignore
  return dx * dx + dy * dy + dz * dz;
}

/** Unit gradient of the field at p (central differences), written into out. */
export function fieldNormal(
  field: Field,
  x: number,
  y: number,
  z: number,
  e: number,
  out: number[],
) {
  const gx = field(x + e, y, z) - field(x - e, y, z);
  const gy = field(x, y + e, z) - field(x, y - e, z);
  const gz = field(x, y, z + e) - field(x, y, z - e);
  const len = Math.hypot(gx, gy, gz) || 1;
  out[0] = gx / len;
  out[1] = gy / len;
  out[2] = gz / len;
  return len / (2 * e);
}

/** Moves vertices halfway to their neighbours' mean, then back onto the surface (Newton steps). */
function relaxAndProject(
  field: Field,
  p: Float64Array,
  tris: Uint32Array,
  passes: number,
  h: number,
): void {
  const n = p.length / 3;
  const sum = new Float64Array(3 * n);
  const deg = new Uint32Array(n);
  const g = [0, 0, 0];
  for (let pass = 0; pass <= passes; pass++) {
    if (pass > 0) {
      sum.fill(0);
      deg.fill(0);
      for (let t = 0; t < tris.length; t += 3) {
        for (let e = 0; e < 3; e++) {
          const a = tris[t + e], b = tris[t + ((e + 1) % 3)]; // prettier-ignore
          for (let c = 0; c < 3; c++) {
            sum[3 * a + c] += p[3 * b + c];
            sum[3 * b + c] += p[3 * a + c];
          }
          deg[a]++;
          deg[b]++;
        }
      }
      for (let i = 0; i < n; i++) {
        for (let c = 0; c < 3; c++) p[3 * i + c] += 0.5 * (sum[3 * i + c] / deg[i] - p[3 * i + c]);
      }
    }
    for (let i = 0; i < n; i++) {
      for (let it = 0; it < 4; it++) {
        const x = p[3 * i], y = p[3 * i + 1], z = p[3 * i + 2]; // prettier-ignore
        const f = field(x, y, z);
        const slope = fieldNormal(field, x, y, z, h * 0.25, g);
        // A step never longer than half a cell keeps thin parts from folding.
        const step = Math.max(-0.5 * h, Math.min(0.5 * h, f / Math.max(slope, 0.2)));
        p[3 * i] -= step * g[0];
        p[3 * i + 1] -= step * g[1];
        p[3 * i + 2] -= step * g[2];
      }
    }
  }
}
