import { Button, Flex, Select, Text } from '@radix-ui/themes';
import { Mono } from '@/components/ui/mono';

/** Props of the pager. */
export interface PagerProps {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  onPageSize: (pageSize: number) => void;
}

const SIZES = [10, 25, 50, 100];

/** "Shots 26–50 of 132", previous / next and the page size. */
export function Pager({ page, pageSize, total, onPage, onPageSize }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <Flex justify="between" align="center" gap="3" wrap="wrap" asChild>
      <nav aria-label="Pages of shots">
        <Text size="2" color="gray" data-testid="shots-range">
          Shots <Mono size="2">{first}</Mono>–<Mono size="2">{last}</Mono> of{' '}
          <Mono size="2">{total}</Mono>
        </Text>
        <Flex align="center" gap="2">
          <Text as="label" size="2" color="gray">
            <Flex align="center" gap="2">
              Rows per page
              <Select.Root
                value={String(pageSize)}
                onValueChange={(v) => onPageSize(Number(v))}
                size="1"
              >
                <Select.Trigger aria-label="Rows per page" />
                <Select.Content>
                  {SIZES.map((s) => (
                    <Select.Item key={s} value={String(s)}>
                      {s}
                    </Select.Item>
                  ))}
                </Select.Content>
              </Select.Root>
            </Flex>
          </Text>
          <Button size="1" variant="soft" disabled={page <= 1} onClick={() => onPage(page - 1)}>
            Previous page
          </Button>
          <Text size="2">
            Page <Mono size="2">{page}</Mono> of <Mono size="2">{pages}</Mono>
          </Text>
          <Button size="1" variant="soft" disabled={page >= pages} onClick={() => onPage(page + 1)}>
            Next page
          </Button>
        </Flex>
      </nav>
    </Flex>
  );
}
