// Checks before a retarget: the profile is self-consistent and finite, and the clip fits the
// character. Each failure is a typed error that says what and where.
import { SolverInputError } from '../errors.js';
import { driverInputCount } from '../dynamics/driver-inputs.js';
import type { Character, Clip, TissueProfile } from '../types.js';

/** PROFILE_MISMATCH / NON_FINITE_VALUE when the profile's parts do not fit together. */
export function checkProfile(profile: TissueProfile): void {
  const { dynamics: d, basis, source } = profile;
  const mismatch = (what: string, item: string): never => {
    throw new SolverInputError('PROFILE_MISMATCH', `profile "${profile.name}": ${what}`, { item });
  };
  if (!(profile.fps > 0) || !Number.isFinite(profile.fps))
    mismatch(`rate ${profile.fps} is not positive`, 'fps');
  if (!(d.k >= 1)) mismatch('the dynamics have no modes (K = 0)', 'dynamics.k');
  const n3 = source.restPositions.length;
  if (basis.length !== n3 * d.k) {
    mismatch(`the basis holds ${basis.length} values, not 3N·K = ${n3}·${d.k}`, 'basis');
  }
  const m = driverInputCount(profile.drivers);
  if (d.m !== m)
    mismatch(`the dynamics take ${d.m} inputs but the drivers give ${m}`, 'dynamics.m');
  const sizes: [string, ArrayLike<number>, number][] = [
    ['dynamics.a1', d.a1, d.k * d.k],
    ['dynamics.a2', d.a2, d.k * d.k],
    ['dynamics.b0', d.b0, d.k * d.m],
    ['dynamics.b1', d.b1, d.k * d.m],
    ['dynamics.inputMean', d.inputMean, d.m],
    ['dynamics.inputScale', d.inputScale, d.m],
  ];
  for (const [item, arr, len] of sizes) {
    if (arr.length !== len) mismatch(`${item} holds ${arr.length} values, not ${len}`, item);
  }
  for (const [item, arr] of [
    ...sizes.map(([i, a]) => [i, a] as const),
    ['basis', basis] as const,
  ]) {
    for (let i = 0; i < arr.length; i++) {
      if (!Number.isFinite(arr[i])) {
        throw new SolverInputError(
          'NON_FINITE_VALUE',
          `profile "${profile.name}": ${item}[${i}] is not finite`,
          { item },
        );
      }
    }
  }
  for (let i = 0; i < d.m; i++) {
    if (!(d.inputScale[i] > 0))
      mismatch(`input ${i} has scale ${d.inputScale[i]}`, 'dynamics.inputScale');
  }
  const names = new Set(source.skeleton.names);
  for (const driver of profile.drivers) {
    if (!names.has(driver.joint))
      mismatch(`driver "${driver.joint}" is not a joint of the source`, 'drivers');
  }
}

/** NON_FINITE_VALUE when the character's rest mesh has a NaN. */
export function checkCharacter(character: Character): void {
  const p = character.restPositions;
  for (let i = 0; i < p.length; i++) {
    if (!Number.isFinite(p[i])) {
      throw new SolverInputError(
        'NON_FINITE_VALUE',
        `rest position of vertex ${(i / 3) | 0} is not finite`,
        {
          vertex: (i / 3) | 0,
        },
      );
    }
  }
}

/**
 * NON_FINITE_VALUE for a NaN in the clip; MISSING_JOINT when the clip animates none of the
 * character's joints (it was made for another skeleton).
 */
export function checkClip(clip: Clip, character: Character): void {
  const jc = clip.jointNames.length;
  for (const [arr, size, what] of [
    [clip.rotations, 4, 'rotation'],
    [clip.translations, 3, 'translation'],
  ] as const) {
    for (let i = 0; i < arr.length; i++) {
      if (!Number.isFinite(arr[i])) {
        const frame = Math.floor(i / (size * jc));
        const joint = clip.jointNames[Math.floor(i / size) % jc];
        throw new SolverInputError(
          'NON_FINITE_VALUE',
          `clip ${what} of "${joint}" at frame ${frame} is not finite`,
          {
            frame,
            joint,
          },
        );
      }
    }
  }
  const names = new Set(character.skeleton.names);
  if (!clip.jointNames.some((n) => names.has(n))) {
    throw new SolverInputError(
      'MISSING_JOINT',
      `the clip "${clip.name}" animates none of the joints of "${character.name}"`,
      { item: clip.name },
    );
  }
}
