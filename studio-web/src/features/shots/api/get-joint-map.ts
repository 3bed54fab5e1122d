// GET /api/shows/:showId/shots/:shotId/joint-map?profileId=: the automatic joint map from the
// profile's driver joints to the shot character's joints, for review before submitting.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { showPath } from '@/features/library/api/library-keys';
import { asArray, asObject, str } from '@/lib/parse-answer';
import { shotKeys } from './shot-keys';

/** The joint map: pairs found, and the profile's joints without a partner. */
export interface JointMap {
  mapped: { source: string; target: string }[];
  unmapped: string[];
  /** Unmapped driver joints the solve cannot do without. */
  essentialUnmapped: string[];
}

const strings = (v: unknown, what: string) =>
  asArray(v ?? [], what).filter((s): s is string => typeof s === 'string');

/** Checks a joint map answer. */
export function parseJointMap(value: unknown): JointMap {
  const b = asObject(value, 'joint map');
  return {
    mapped: asArray(b.mapped, 'joint map').map((m) => {
      const pair = asObject(m, 'joint map pair');
      return {
        source: str(pair, 'source', 'joint map pair'),
        target: str(pair, 'target', 'joint map pair'),
      };
    }),
    unmapped: strings(b.unmapped, 'joint map'),
    essentialUnmapped: strings(b.essentialUnmapped, 'joint map'),
  };
}

/** Fetches the joint map for a shot and a profile. */
export function getJointMap(
  showId: string,
  shotId: string,
  profileId: string,
  { signal }: { signal?: AbortSignal } = {},
) {
  return apiRequest(
    `${showPath(showId)}/shots/${encodeURIComponent(shotId)}/joint-map?profileId=${encodeURIComponent(profileId)}`,
    { signal },
    parseJointMap,
  );
}

/** Query options for a joint map. */
export function getJointMapQueryOptions(showId: string, shotId: string, profileId: string) {
  return queryOptions({
    queryKey: shotKeys.jointMap(showId, shotId, profileId),
    queryFn: ({ signal }) => getJointMap(showId, shotId, profileId, { signal }),
  });
}

/** The joint map for the chosen profile; idle until one is chosen. */
export function useJointMap(showId: string, shotId: string, profileId: string | undefined) {
  return useQuery({
    ...getJointMapQueryOptions(showId, shotId, profileId ?? ''),
    enabled: !!profileId,
  });
}
