import { Button, Dialog, Flex, Kbd, Table } from '@radix-ui/themes';
import { SHELL_SHORTCUTS } from './shell-shortcuts';

/** Props of the shortcut list. */
export interface ShortcutsDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
}

/** The list of the shell's keyboard shortcuts. */
export function ShortcutsDialog({ open, onOpenChange }: ShortcutsDialogProps) {
  return (
    <Dialog.Root open={open} onOpenChange={onOpenChange}>
      <Dialog.Content maxWidth="480px">
        <Dialog.Title>Keyboard shortcuts</Dialog.Title>
        <Dialog.Description size="2" color="gray" mb="3">
          Type them anywhere outside a text field. Press g, then the second key.
        </Dialog.Description>
        <Table.Root size="1">
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Keys</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Does</Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {SHELL_SHORTCUTS.map((s) => (
              <Table.Row key={s.keys.join(' ')}>
                <Table.Cell>
                  <Flex gap="1" align="center">
                    {s.keys.map((k, i) => (
                      <Kbd key={`${k}-${i}`}>{k}</Kbd>
                    ))}
                  </Flex>
                </Table.Cell>
                <Table.Cell>{s.does}</Table.Cell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
        <Flex justify="end" mt="4">
          <Dialog.Close>
            <Button variant="soft" color="gray">
              Close
            </Button>
          </Dialog.Close>
        </Flex>
      </Dialog.Content>
    </Dialog.Root>
  );
}
