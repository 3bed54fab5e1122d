import { Select } from '@radix-ui/themes';
import { matchPath, useLocation, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useShows } from '../api/get-shows';

/** The show sections a switch of show keeps you in. */
const SECTIONS = [paths.library, paths.shots, paths.tracking] as const;

const ALL_SHOWS = '__all__';

/** Where to go in `showId` from `pathname`: the same section, else the show's shots. */
export function sameSectionHref(pathname: string, showId: string): string {
  for (const section of SECTIONS) {
    if (matchPath({ path: section.path, end: false }, pathname)) return section.getHref(showId);
  }
  return paths.shots.getHref(showId);
}

/** Picks the show to work in; switching keeps the section (Library, Shots, Tracking). */
export function ShowPicker({ showId }: { showId: string | undefined }) {
  const shows = useShows();
  const navigate = useNavigate();
  const { pathname } = useLocation();
  const list = shows.data ?? [];
  const known = showId !== undefined && list.some((s) => s.id === showId);

  return (
    <Select.Root
      size="2"
      value={known ? showId : ''}
      disabled={shows.isPending}
      onValueChange={(value) =>
        void navigate(
          value === ALL_SHOWS ? paths.shows.getHref() : sameSectionHref(pathname, value),
        )
      }
    >
      <Select.Trigger
        variant="soft"
        color="gray"
        aria-label="Show"
        placeholder={shows.isPending ? 'Loading shows…' : 'Choose a show'}
        data-testid="show-picker"
        style={{ minWidth: 180 }}
      />
      <Select.Content position="popper">
        <Select.Group>
          <Select.Label>Your shows</Select.Label>
          {list.map((show) => (
            <Select.Item key={show.id} value={show.id}>
              {show.code} · {show.name}
            </Select.Item>
          ))}
        </Select.Group>
        <Select.Separator />
        <Select.Item value={ALL_SHOWS}>All shows…</Select.Item>
      </Select.Content>
    </Select.Root>
  );
}
