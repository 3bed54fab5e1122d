// Which of a profile's driver joints find a joint on a shot's character, before anything is
// queued: the solver's own name matching (mapJoints) with the stored share of each driver's input,
// so the API answers the same as the retarget would.
import { DRIVER_MAP_DEFAULTS, mapJoints } from '@overshoot/solver';
import type { TissueProfile } from '../library/entities/tissue-profile.entity';

/** The automatic map of a profile's drivers onto a character's joints. */
export interface DriverMapView {
  mapped: { source: string; target: string }[];
  unmapped: string[];
  /** Unmapped drivers that carry enough of the input that the solve refuses to run without them. */
  essentialUnmapped: string[];
}

/** One unmapped driver and its share of the profile's input energy. */
export interface UnmappedDriver {
  joint: string;
  energyShare: number;
}

/** Maps the profile's drivers onto `targetJoints`, with `overrides` (source → target) first. */
export function mapProfileDrivers(
  profile: TissueProfile,
  targetJoints: string[],
  overrides: Record<string, string> | null = null,
): DriverMapView & { essential: UnmappedDriver[] } {
  const source = profile.sourceJoints ?? [];
  const drivers = profile.drivers ?? [];
  const all = mapJoints(source, targetJoints, overrides);
  const targetOf = new Map(all.entries.map((e) => [e.source, e.target]));
  const mapped: DriverMapView['mapped'] = [];
  const unmapped: string[] = [];
  const essential: UnmappedDriver[] = [];
  for (const d of drivers) {
    const target = targetOf.get(d.joint) ?? null;
    if (target) mapped.push({ source: d.joint, target });
    else {
      unmapped.push(d.joint);
      if (d.energyShare >= DRIVER_MAP_DEFAULTS.essentialShare) essential.push(d);
    }
  }
  return { mapped, unmapped, essentialUnmapped: essential.map((d) => d.joint), essential };
}

/** Joint map entries that name a joint the profile or the character does not have. */
export function badJointMapEntries(
  jointMap: Record<string, unknown>,
  sourceJoints: string[],
  targetJoints: string[],
): { field: string; problems: string[] }[] {
  const out: { field: string; problems: string[] }[] = [];
  for (const [source, target] of Object.entries(jointMap)) {
    const problems: string[] = [];
    if (!sourceJoints.includes(source)) problems.push(`the profile has no joint "${source}"`);
    if (typeof target !== 'string') problems.push('must be a joint name');
    else if (!targetJoints.includes(target))
      problems.push(`the shot's character has no joint "${target}"`);
    if (problems.length > 0) out.push({ field: `jointMap.${source}`, problems });
  }
  return out;
}
