import { Badge, Flex, Tabs } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { useSearchParams } from 'react-router-dom';

/** One tab of the library. */
export interface LibraryTab {
  value: string;
  label: string;
  count: number | undefined;
  content: ReactNode;
}

/** The library's sections as tabs; the open one is kept in the address (`?tab=clips`). */
export function LibraryTabs({ tabs }: { tabs: LibraryTab[] }) {
  const [params, setParams] = useSearchParams();
  const wanted = params.get('tab');
  const current = tabs.some((t) => t.value === wanted) ? (wanted as string) : tabs[0].value;
  return (
    <Tabs.Root
      value={current}
      onValueChange={(value) =>
        setParams(
          (p) => {
            p.set('tab', value);
            return p;
          },
          { replace: true },
        )
      }
    >
      <Tabs.List aria-label="Library sections">
        {tabs.map((t) => (
          <Tabs.Trigger key={t.value} value={t.value}>
            <Flex align="center" gap="2">
              {t.label}
              {t.count !== undefined ? (
                <Badge size="1" variant="soft" color="gray" className="mono">
                  {t.count}
                </Badge>
              ) : null}
            </Flex>
          </Tabs.Trigger>
        ))}
      </Tabs.List>
      {tabs.map((t) => (
        <Tabs.Content key={t.value} value={t.value}>
          <Flex direction="column" gap="3" pt="4">
            {t.content}
          </Flex>
        </Tabs.Content>
      ))}
    </Tabs.Root>
  );
}
