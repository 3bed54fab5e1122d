import { Kbd } from '@radix-ui/themes';
import { keyLabels, type ShortcutCommand } from '@/config/shortcuts';

/** The key of a shortcut, shown beside the button it presses (from config/shortcuts.ts). */
export function KeyHint({ command }: { command: ShortcutCommand }) {
  return (
    <Kbd size="1" aria-hidden>
      {keyLabels(command).join(' ')}
    </Kbd>
  );
}
