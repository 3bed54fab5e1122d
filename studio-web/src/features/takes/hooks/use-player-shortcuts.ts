// Listens for the take player's keyboard shortcuts anywhere on the page.
import { useEffect, useRef } from 'react';
import { commandForKey, type PlayerCommand } from '../transport/shortcuts';

/** Calls `run` with the command of each shortcut pressed (see transport/shortcuts.ts). */
export function usePlayerShortcuts(run: (command: PlayerCommand) => void, enabled = true): void {
  const latest = useRef(run);
  useEffect(() => {
    latest.current = run;
  });
  useEffect(() => {
    if (!enabled) return;
    const onKey = (e: KeyboardEvent) => {
      // A dialog owns the keyboard while it is open.
      if (document.querySelector('[role="alertdialog"], [role="dialog"]')) return;
      const command = commandForKey(e);
      if (!command) return;
      e.preventDefault();
      latest.current(command);
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [enabled]);
}
