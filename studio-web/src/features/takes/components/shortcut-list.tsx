import { Flex, Kbd, Text } from '@radix-ui/themes';
import { SHORTCUTS } from '../transport/shortcuts';

/** The player's keyboard shortcuts, folded away until asked for. */
export function ShortcutList() {
  return (
    <details className="take-shortcuts">
      <summary>
        <Text size="2">Keyboard shortcuts</Text>
      </summary>
      <Flex direction="column" gap="1" mt="2" asChild>
        <dl>
          {SHORTCUTS.map((s) => (
            <Flex key={s.command} gap="3" align="center">
              <dt className="take-shortcut-keys">
                <Kbd>{s.keys}</Kbd>
              </dt>
              <dd>
                <Text size="2">{s.does}</Text>
              </dd>
            </Flex>
          ))}
        </dl>
      </Flex>
    </details>
  );
}
