// POST /api/admin/shows: create a show.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { parseShow, type Show } from '@/features/shows';
import { apiRequest } from '@/lib/api-client';

/** The new show's code (stored upper case) and name. */
export interface CreateShowInput {
  code: string;
  name: string;
}

/** Creates a show. */
export function createShow(input: CreateShowInput): Promise<Show> {
  return apiRequest('/admin/shows', { method: 'POST', body: input }, parseShow);
}

/** Mutation creating a show; refreshes every show list. */
export function useCreateShow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createShow,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: ['shows'] }),
  });
}
