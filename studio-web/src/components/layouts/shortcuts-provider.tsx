// The one keyboard listener of the studio. It reads the shortcut table (config/shortcuts.ts);
// pages register handlers for the commands they offer while they are on screen. One listener
// means a key goes to one command: after the "go" prefix the next key only ends the sequence,
// and nothing fires while typing in a field or while a dialog or menu is open.
import { createContext, useContext, useEffect, useMemo, useRef, type ReactNode } from 'react';
import { SEQUENCE_MS, SHORTCUTS, type ShortcutCommand } from '@/config/shortcuts';
import { keepsKey, matchStrokes, strokeOf } from '@/lib/key-strokes';

/** Handlers for some commands of the shortcut table. */
export type ShortcutHandlers = Partial<Record<ShortcutCommand, () => void>>;

interface Registration {
  commands: ReadonlySet<ShortcutCommand>;
  run: (command: ShortcutCommand) => void;
}

interface ShortcutsContextValue {
  register: (entry: Registration) => () => void;
  openHelp: () => void;
}

const ShortcutsContext = createContext<ShortcutsContextValue | null>(null);

// While one of these is open, its own keys (Esc, arrows, typing) are all that count.
const MODAL_SELECTOR = '[role="dialog"], [role="alertdialog"], [role="menu"], [role="listbox"]';

/** Props of the shortcut listener. */
export interface ShortcutsProviderProps {
  /** Off while signed out. */
  enabled: boolean;
  /** Opens the shortcut list ('?', or a page's "Keyboard shortcuts" button). */
  onHelp: () => void;
  children: ReactNode;
}

/** Listens for every shortcut and runs the handler the page on screen registered for it. */
export function ShortcutsProvider({ enabled, onHelp, children }: ShortcutsProviderProps) {
  const entries = useRef<Registration[]>([]);
  const help = useRef(onHelp);
  useEffect(() => {
    help.current = onHelp;
  });

  useEffect(() => {
    if (!enabled) return;
    let typed: string[] = [];
    let typedAt = 0;
    const onKey = (event: KeyboardEvent) => {
      if (event.defaultPrevented || event.isComposing) return;
      const stroke = strokeOf(event);
      if (!stroke || document.querySelector(MODAL_SELECTOR) || keepsKey(event.target, stroke)) {
        typed = [];
        return;
      }
      const now = performance.now();
      const pending = typed.length > 0 && now - typedAt <= SEQUENCE_MS ? typed : [];
      const match = matchStrokes(SHORTCUTS, [...pending, stroke]);
      typed = [];
      if (match.kind === 'prefix') {
        typed = [...pending, stroke];
        typedAt = now;
        event.preventDefault();
        return;
      }
      // The key after a prefix belongs to the sequence, matched or not: "g h" never reaches a
      // page's own "h".
      if (pending.length > 0) event.preventDefault();
      if (match.kind !== 'command') return;
      if (match.command === 'showHelp') {
        event.preventDefault();
        help.current();
        return;
      }
      const entry = [...entries.current].reverse().find((e) => e.commands.has(match.command));
      if (!entry) return;
      event.preventDefault();
      entry.run(match.command);
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [enabled]);

  const value = useMemo<ShortcutsContextValue>(
    () => ({
      register: (entry) => {
        entries.current = [...entries.current, entry];
        return () => {
          entries.current = entries.current.filter((e) => e !== entry);
        };
      },
      openHelp: () => help.current(),
    }),
    [],
  );
  return <ShortcutsContext.Provider value={value}>{children}</ShortcutsContext.Provider>;
}

/** Runs `handlers` for their commands' keys while the calling component is on screen. */
export function useShortcutHandlers(handlers: ShortcutHandlers, enabled = true): void {
  const context = useContext(ShortcutsContext);
  const latest = useRef(handlers);
  useEffect(() => {
    latest.current = handlers;
  });
  const commands = (Object.keys(handlers) as ShortcutCommand[])
    .filter((c) => handlers[c])
    .sort()
    .join(' ');
  useEffect(() => {
    if (!context || !enabled || !commands) return;
    return context.register({
      commands: new Set(commands.split(' ') as ShortcutCommand[]),
      run: (command) => latest.current[command]?.(),
    });
  }, [context, enabled, commands]);
}

/** Opens the shortcut list; does nothing outside the signed-in layout. */
export function useOpenShortcutHelp(): () => void {
  const context = useContext(ShortcutsContext);
  return context?.openHelp ?? noop;
}

function noop() {}
