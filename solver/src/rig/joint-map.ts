// Joint mapping between skeletons with different naming conventions: exact names first, then
// names normalised for case, separators, namespaces, digit padding and left/right markers
// (prefixes such as Left/L_/l_, suffixes such as _l/.L/Right). An explicit map always wins.
// Nothing is guessed beyond that: joints without a match are reported as unmapped.
import { SolverInputError } from '../errors.js';
import type { Driver, LinearDynamics } from '../types.js';

/** How a source joint found its target. */
export type JointMatch = 'file' | 'exact' | 'normalised' | 'unmapped';

/** One source joint and its target (null when unmapped). */
export interface JointMapEntry {
  source: string;
  target: string | null;
  how: JointMatch;
}

/** A mapping from source joints to target joints. */
export interface JointMapping {
  entries: JointMapEntry[];
  /** Target joint index per source joint (−1: unmapped). */
  targetOf: Int32Array;
  /** Source joint index per target joint (−1: none maps to it). */
  sourceOf: Int32Array;
}

const SEP = /[\s_.\-|]/;

/**
 * A comparison key for a joint name: side marker ('l', 'r' or '') and a stem in lower case
 * without separators and with leading zeros of numbers dropped. "LeftUpLeg", "upleg_l" and
 * "UpLeg.L" share the key "l:upleg"; "spine.002", "spine_02" and "Spine2" share ":spine2".
 */
export function jointNameKey(raw: string): string {
  let name = raw.slice(Math.max(raw.lastIndexOf(':'), raw.lastIndexOf('|')) + 1);
  let side = '';
  const take = (s: 'l' | 'r', rest: string): void => {
    side = s;
    name = rest;
  };
  let m: RegExpMatchArray | null;
  if ((m = name.match(/^(Left|Right|LEFT|RIGHT)(?=[A-Z0-9])/))) {
    take(m[1].toLowerCase()[0] as 'l' | 'r', name.slice(m[0].length));
  } else if ((m = name.match(/^(left|right)[\s_.-]/i)) && m[0].length < name.length) {
    take(m[1].toLowerCase()[0] as 'l' | 'r', name.slice(m[0].length));
  } else if ((m = name.match(/^([lr])[\s_.-]/i))) {
    take(m[1].toLowerCase() as 'l' | 'r', name.slice(2));
  } else if ((m = name.match(/[\s_.-](left|right|l|r)$/i)) && m.index! > 0) {
    take(m[1].toLowerCase()[0] as 'l' | 'r', name.slice(0, m.index));
  } else if ((m = name.match(/[a-z0-9](Left|Right|L|R)$/)) && m.index !== undefined) {
    take(m[1][0].toLowerCase() as 'l' | 'r', name.slice(0, m.index + 1));
  }
  const stem = name
    .split(SEP)
    .join('')
    .toLowerCase()
    .replace(/\d+/g, (d) => String(Number(d)));
  return `${side}:${stem}`;
}

/**
 * Maps `source` joint names to `target` ones: `overrides` (source → target, null for "leave
 * unmapped") first, then exact names, then unique normalised keys. BAD_JOINT_MAP when an
 * override names a joint that does not exist.
 */
export function mapJoints(
  source: string[],
  target: string[],
  overrides: Record<string, string | null> | null = null,
): JointMapping {
  const targetIndex = new Map(target.map((n, i) => [n, i]));
  const byKey = new Map<string, number[]>();
  target.forEach((n, i) => {
    const key = jointNameKey(n);
    byKey.set(key, [...(byKey.get(key) ?? []), i]);
  });
  for (const [s, t] of Object.entries(overrides ?? {})) {
    if (!source.includes(s)) {
      throw new SolverInputError(
        'BAD_JOINT_MAP',
        `the joint map names source joint "${s}", which the profile does not have`,
        { joint: s },
      );
    }
    if (t !== null && !targetIndex.has(t)) {
      throw new SolverInputError(
        'BAD_JOINT_MAP',
        `the joint map sends "${s}" to "${t}", which the character does not have`,
        { joint: t },
      );
    }
  }
  const targetOf = new Int32Array(source.length).fill(-1);
  const sourceOf = new Int32Array(target.length).fill(-1);
  const entries = source.map((s, i): JointMapEntry => {
    let how: JointMatch = 'unmapped';
    let t = -1;
    if (overrides && Object.prototype.hasOwnProperty.call(overrides, s)) {
      const o = overrides[s];
      if (o !== null) {
        t = targetIndex.get(o)!;
        how = 'file';
      }
    } else if (targetIndex.has(s)) {
      t = targetIndex.get(s)!;
      how = 'exact';
    } else {
      const hits = byKey.get(jointNameKey(s)) ?? [];
      if (hits.length === 1) {
        t = hits[0];
        how = 'normalised';
      }
    }
    targetOf[i] = t;
    if (t >= 0 && sourceOf[t] < 0) sourceOf[t] = i;
    return { source: s, target: t >= 0 ? target[t] : null, how };
  });
  return { entries, targetOf, sourceOf };
}

/** Reads a joint map file `{ "sourceJoint": "targetJoint" }`; BAD_JOINT_MAP when malformed. */
export function parseJointMap(text: string): Record<string, string | null> {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (e) {
    throw new SolverInputError(
      'BAD_JOINT_MAP',
      `the joint map is not JSON: ${(e as Error).message}`,
      {},
    );
  }
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new SolverInputError(
      'BAD_JOINT_MAP',
      'the joint map must be an object { "sourceJoint": "targetJoint" }',
      {},
    );
  }
  const out: Record<string, string | null> = {};
  for (const [k, v] of Object.entries(value)) {
    if (v !== null && typeof v !== 'string') {
      throw new SolverInputError(
        'BAD_JOINT_MAP',
        `the joint map entry "${k}" must be a joint name or null`,
        { joint: k },
      );
    }
    out[k] = v;
  }
  return out;
}

/** Options for mapping a profile's drivers. */
export interface DriverMapOptions {
  /** Explicit source → target joint names (null: leave unmapped). */
  overrides?: Record<string, string | null> | null;
  /** Share of the input energy from which a driver counts as essential. */
  essentialShare?: number;
}

/** Default driver map options (5 % is our choice: below it a driver barely moves the tissue). */
export const DRIVER_MAP_DEFAULTS: Required<DriverMapOptions> = {
  overrides: null,
  essentialShare: 0.05,
};

/** Drivers mapped onto a target skeleton. */
export interface DriverMapping {
  /** One entry per driver, in the profile's order. */
  entries: (JointMapEntry & { energyShare: number; essential: boolean })[];
  /** Target joint index per driver (−1: unmapped; its inputs stay at their mean). */
  targetJoints: Int32Array;
  /** Names of unmapped drivers (never silently dropped: retarget reports them). */
  unmapped: string[];
}

/**
 * Share of input energy per driver: the squared norms of its columns of B0 and B1 (inputs are
 * scaled to unit variance, so columns compare directly), normalised to sum to 1.
 */
export function driverEnergyShares(drivers: Driver[], dynamics: LinearDynamics): Float64Array {
  const { k, m, b0, b1 } = dynamics;
  const shares = new Float64Array(drivers.length);
  let col = 0;
  let total = 0;
  drivers.forEach((d, i) => {
    for (let c = col; c < col + 3 * d.signals.length && c < m; c++) {
      for (let r = 0; r < k; r++) shares[i] += b0[r * m + c] ** 2 + b1[r * m + c] ** 2;
    }
    col += 3 * d.signals.length;
    total += shares[i];
  });
  if (total > 0) for (let i = 0; i < shares.length; i++) shares[i] /= total;
  return shares;
}

/**
 * Maps drivers to target joints (see `mapJoints`). Throws UNMAPPED_DRIVER when a driver that
 * carries at least `essentialShare` of the input energy has no target.
 */
export function mapDrivers(
  drivers: Driver[],
  dynamics: LinearDynamics,
  sourceJoints: string[],
  targetJoints: string[],
  options: DriverMapOptions = {},
): DriverMapping {
  const opts = { ...DRIVER_MAP_DEFAULTS, ...options };
  const all = mapJoints(sourceJoints, targetJoints, opts.overrides);
  const shares = driverEnergyShares(drivers, dynamics);
  const entries = drivers.map((d, i) => {
    const s = sourceJoints.indexOf(d.joint);
    const base: JointMapEntry =
      s >= 0 ? all.entries[s] : { source: d.joint, target: null, how: 'unmapped' };
    return { ...base, energyShare: shares[i], essential: shares[i] >= opts.essentialShare };
  });
  const missing = entries.filter((e) => e.target === null && e.essential);
  if (missing.length > 0) {
    const list = missing.map(
      (e) => `"${e.source}" (${(100 * e.energyShare).toFixed(0)} % of the input)`,
    );
    throw new SolverInputError(
      'UNMAPPED_DRIVER',
      `no joint of the character matches driver ${list.join(', ')}; map it in a joint map file`,
      { joint: missing[0].source },
    );
  }
  return {
    entries,
    targetJoints: Int32Array.from(entries, (e) =>
      e.target === null ? -1 : targetJoints.indexOf(e.target),
    ),
    unmapped: entries.filter((e) => e.target === null).map((e) => e.source),
  };
}
