import { Button, Dialog, Flex, Grid, Heading, Kbd, Table, Text } from '@radix-ui/themes';
import { SHORTCUT_GROUPS, SHORTCUTS, strokeLabel, type ShortcutGroup } from '@/config/shortcuts';

// Two columns of about the same length.
const COLUMNS: readonly ShortcutGroup[][] = [
  ['go', 'anywhere', 'notes'],
  ['transport', 'view'],
];

function GroupTable({ group }: { group: ShortcutGroup }) {
  const title = SHORTCUT_GROUPS.find((g) => g.group === group)?.title ?? group;
  return (
    <section aria-labelledby={`shortcuts-${group}`}>
      <Heading as="h3" size="2" mb="1" id={`shortcuts-${group}`}>
        {title}
      </Heading>
      <Table.Root size="1">
        <Table.Body>
          {SHORTCUTS.filter((s) => s.group === group).map((s) => (
            <Table.Row key={s.command} data-testid={`shortcut-${s.command}`}>
              <Table.Cell width="96px">
                <Flex gap="1" align="center">
                  {s.keys.map((k, i) => (
                    <Kbd key={`${k}-${i}`} data-testid="shortcut-key">
                      {strokeLabel(k)}
                    </Kbd>
                  ))}
                </Flex>
              </Table.Cell>
              <Table.Cell>
                <Text size="2">{s.does}</Text>
              </Table.Cell>
            </Table.Row>
          ))}
          {group === 'anywhere' ? (
            <Table.Row>
              <Table.Cell>
                <Kbd>Esc</Kbd>
              </Table.Cell>
              <Table.Cell>
                <Text size="2">Close a dialog or menu</Text>
              </Table.Cell>
            </Table.Row>
          ) : null}
        </Table.Body>
      </Table.Root>
    </section>
  );
}

/** Props of the shortcut list. */
export interface ShortcutsDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
}

/** Every keyboard shortcut of the studio, by where it works. */
export function ShortcutsDialog({ open, onOpenChange }: ShortcutsDialogProps) {
  return (
    <Dialog.Root open={open} onOpenChange={onOpenChange}>
      <Dialog.Content maxWidth="820px" data-testid="shortcuts-dialog">
        <Dialog.Title>Keyboard shortcuts</Dialog.Title>
        <Dialog.Description size="2" color="gray" mb="3">
          Type them anywhere outside a text field. For two keys, press G, then the second key within
          a second and a half. The take player's keys work on a take's page.
        </Dialog.Description>
        <Grid columns={{ initial: '1', sm: '2' }} gap="5">
          {COLUMNS.map((groups) => (
            <Flex key={groups.join()} direction="column" gap="4">
              {groups.map((group) => (
                <GroupTable key={group} group={group} />
              ))}
            </Flex>
          ))}
        </Grid>
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
