// Isosurface meshing of a distance field: on the surface, closed, facing outwards.
import { describe, expect, it } from 'vitest';
import { shapeDistance, smoothUnion } from '../generate/body/sdf.js';
import { surfaceNets } from '../generate/body/surface-nets.js';

const R = 0.3;
const sphere = (x: number, y: number, z: number) => Math.hypot(x, y, z) - R;
const mesh = surfaceNets(sphere, [-R, -R, -R], [R, R, R], { cell: 0.03 });

describe('surface nets', () => {
  it('puts every vertex on the surface', () => {
    const p = mesh.positions;
    for (let i = 0; i < p.length; i += 3) {
      expect(Math.abs(Math.hypot(p[i], p[i + 1], p[i + 2]) - R)).toBeLessThan(1e-6);
    }
  });

  it('makes a closed mesh: every edge is used once in each direction', () => {
    const edges = new Map<string, number>();
    const t = mesh.triangles;
    for (let i = 0; i < t.length; i += 3) {
      for (let e = 0; e < 3; e++) {
        const key = `${t[i + e]},${t[i + ((e + 1) % 3)]}`;
        edges.set(key, (edges.get(key) ?? 0) + 1);
      }
    }
    for (const [key, count] of edges) {
      const [a, b] = key.split(',');
      expect(count).toBe(1);
      expect(edges.get(`${b},${a}`)).toBe(1);
    }
  });

  it('winds triangles counter-clockwise seen from outside (volume of a sphere)', () => {
    const p = mesh.positions;
    const t = mesh.triangles;
    let volume = 0;
    for (let i = 0; i < t.length; i += 3) {
      const [a, b, c] = [3 * t[i], 3 * t[i + 1], 3 * t[i + 2]];
      volume +=
        (p[a] * (p[b + 1] * p[c + 2] - p[b + 2] * p[c + 1]) -
          p[a + 1] * (p[b] * p[c + 2] - p[b + 2] * p[c]) +
          p[a + 2] * (p[b] * p[c + 1] - p[b + 1] * p[c])) /
        6;
    }
    expect(volume / ((4 / 3) * Math.PI * R ** 3)).toBeCloseTo(1, 1);
  });
});

describe('distance primitives', () => {
  it('measure a capsule and an ellipsoid exactly on their axes', () => {
    const capsule = { kind: 'cone', a: [0, 0, 0], b: [0, 1, 0], ra: 0.1, rb: 0.1 } as const;
    expect(shapeDistance(capsule, 0.3, 0.5, 0)).toBeCloseTo(0.2, 12);
    expect(shapeDistance(capsule, 0, 1.5, 0)).toBeCloseTo(0.4, 12);
    const cone = { kind: 'cone', a: [0, 0, 0], b: [0, 1, 0], ra: 0.2, rb: 0.1 } as const;
    expect(shapeDistance(cone, 0, -0.5, 0)).toBeCloseTo(0.3, 12);
    const ellipsoid = { kind: 'ellipsoid', c: [0, 0, 0], r: [0.2, 0.4, 0.3] } as const;
    expect(shapeDistance(ellipsoid, 0, 0.5, 0)).toBeCloseTo(0.1, 12);
    expect(shapeDistance(ellipsoid, 0.2, 0, 0)).toBeCloseTo(0, 12);
  });

  it('blend smoothly: the union is never above the nearest part and close to it far away', () => {
    expect(smoothUnion([0.05, 0.05], 0.02)).toBeCloseTo(0.05 - 0.02 * Math.log(2), 12);
    expect(smoothUnion([0.1, 0.5], 0.02)).toBeGreaterThan(0.1 - 1e-8);
    expect(smoothUnion([0.1, 0.5], 0.02)).toBeLessThanOrEqual(0.1);
  });
});
