// Public face of the shows feature: the caller's shows, a show's members, the current show.
export { getShows, getShowsQueryOptions, useShows } from './api/get-shows';
export {
  getShowMembers,
  getShowMembersQueryOptions,
  useShowMembers,
  type ShowMember,
} from './api/get-show-members';
export { parseShow, parseShows, type Show } from './api/show';
export { useCurrentShow, useShowIdParam, type CurrentShow } from './hooks/use-current-show';
