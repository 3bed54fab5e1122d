import { useEffect, useRef } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { NavItem } from './nav-items';
import { isTyping, SEQUENCE_MS, shortcutTarget } from './shell-shortcuts';

/** Listens for the shell's shortcuts (see SHELL_SHORTCUTS) while signed in. */
export function useShellShortcuts(items: NavItem[], onHelp: () => void, enabled: boolean) {
  const navigate = useNavigate();
  const gPressedAt = useRef<number | null>(null);

  useEffect(() => {
    if (!enabled) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.defaultPrevented || event.ctrlKey || event.metaKey || event.altKey) return;
      if (isTyping(event.target)) return;
      const started = gPressedAt.current;
      gPressedAt.current = null;
      if (event.key === '?') {
        event.preventDefault();
        onHelp();
        return;
      }
      if (started !== null && event.timeStamp - started <= SEQUENCE_MS) {
        const href = shortcutTarget(event.key.toLowerCase(), items, paths.shows.getHref());
        if (href) {
          event.preventDefault();
          void navigate(href);
        }
        return;
      }
      if (event.key === 'g') gPressedAt.current = event.timeStamp;
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [items, onHelp, enabled, navigate]);
}
