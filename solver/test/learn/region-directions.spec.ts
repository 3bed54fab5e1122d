// Tissue directions per region on a small invented capture with one known damped mode.
import { describe, expect, it } from 'vitest';
import { poseFeatures, unpose } from '../../src/index.js';
import { regionDirections } from '../../src/learn/region-directions.js';
import { tissueCapture } from '../helpers/tissue-capture.js';

const data = tissueCapture(4, 60);
const T = data.capture.frameCount;
const features = poseFeatures(data.character.skeleton, data.clip);
const { residuals } = unpose(data.character, data.capture, data.clip);

describe('regionDirections', () => {
  it('finds the one tissue direction, with the mode shape, in the region it moves', () => {
    const dirs = regionDirections(residuals, T, data.character, features);
    expect(dirs.k).toBe(1);
    expect(dirs.fallback).toBe(false);
    const d = data.shape.length;
    let dot = 0;
    let norm = 0;
    for (let c = 0; c < d; c++) {
      dot += dirs.basis[c] * data.shape[c];
      norm += data.shape[c] ** 2;
    }
    expect(Math.abs(dot) / Math.sqrt(norm)).toBeGreaterThan(0.9999);
    // The shape lives on the soft vertices, all in one region.
    const soft = new Set<number>();
    for (let i = 0; i < d / 3; i++) if (data.shape[3 * i] !== 0) soft.add(dirs.regions.labels[i]);
    expect([...soft]).toEqual([dirs.region[0]]);
  });

  it('finds none in a residual that skinning explains entirely', () => {
    const still = new Float32Array(residuals.length);
    expect(regionDirections(still, T, data.character, features).k).toBe(0);
  });

  it('keeps the least pose-explained direction when the pose explains every one', () => {
    // A threshold no direction can pass: the capture still yields one direction.
    const dirs = regionDirections(residuals, T, data.character, features, { poseExplained: 0 });
    expect(dirs.k).toBe(1);
    expect(dirs.fallback).toBe(true);
  });
});
