// POST /api/shows/:showId/profiles: learn a tissue profile from a capture on a character.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys, showPath } from './library-keys';
import { parseProfile, type Profile } from './profile-types';

/** What to learn from. */
export interface CreateProfileInput {
  name: string;
  captureId: string;
  characterId: string;
}

/** Queues a learn job; answers with the profile in its queued state. */
export function createProfile(showId: string, input: CreateProfileInput): Promise<Profile> {
  return apiRequest(`${showPath(showId)}/profiles`, { method: 'POST', body: input }, parseProfile);
}

/** Mutation that queues a learn job, seeds the profile's cache entry and refreshes the list. */
export function useCreateProfile(showId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateProfileInput) => createProfile(showId, input),
    onSuccess: (profile) => {
      queryClient.setQueryData(libraryKeys.profile(showId, profile.id), profile);
      void queryClient.invalidateQueries({ queryKey: libraryKeys.profiles(showId) });
    },
  });
}
