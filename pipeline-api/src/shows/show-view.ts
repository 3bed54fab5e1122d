import type { Show } from './entities/show.entity';

/** A show as the API shows it. */
export interface ShowView {
  id: string;
  code: string;
  name: string;
  archived: boolean;
  createdAt: string;
}

/** The view of a show. */
export const showView = (s: Show): ShowView => ({
  id: s.id,
  code: s.code,
  name: s.name,
  archived: !!s.archivedAt,
  createdAt: s.createdAt.toISOString(),
});

/** The one answer for a show that does not exist and a show the caller may not see. */
export const SHOW_NOT_FOUND_MESSAGE = (showId: string) =>
  `No show ${showId}, or you are not a member of it.`;
