import { describe, expect, it } from 'vitest';
import { writeDynamicWeights } from './live-tuning';

describe('writeDynamicWeights', () => {
  it('fills only the dynamic targets of each frame and leaves the correctives alone', () => {
    // Two frames of four targets: dynamic at 0–1, correctives at 2–3 (marked 9).
    const all = Float32Array.from([0, 0, 9, 9, 0, 0, 9, 9]);
    const layout = {
      count: 4,
      dynamic: { first: 0, count: 2 },
      corrective: { first: 2, count: 2, errorBound: 0, tolerance: 0 },
    };
    writeDynamicWeights(all, layout, Float32Array.from([1, 2, 3, 4]));
    expect(Array.from(all)).toEqual([1, 2, 9, 9, 3, 4, 9, 9]);
  });

  it('writes after correctives when the dynamic targets come second', () => {
    const all = new Float32Array(6);
    const layout = {
      count: 3,
      dynamic: { first: 1, count: 2 },
      corrective: { first: 0, count: 1, errorBound: 0, tolerance: 0 },
    };
    writeDynamicWeights(all, layout, Float32Array.from([5, 6, 7, 8]));
    expect(Array.from(all)).toEqual([0, 5, 6, 0, 7, 8]);
  });
});
