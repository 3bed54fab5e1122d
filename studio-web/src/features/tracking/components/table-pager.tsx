import { Button, Flex, Text } from '@radix-ui/themes';
import { Mono } from '@/components/ui/mono';

/** Props of the pager. */
export interface TablePagerProps {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
}

/** "Shots 26–50 of 120" with previous and next. */
export function TablePager({ page, pageSize, total, onPage }: TablePagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <Flex justify="between" align="center" gap="3" asChild>
      <nav aria-label="Pages of the shot table">
        <Text size="2" color="gray" data-testid="table-range">
          Shots <Mono size="2">{first}</Mono>–<Mono size="2">{last}</Mono> of{' '}
          <Mono size="2">{total}</Mono>
        </Text>
        <Flex gap="2" align="center">
          <Button variant="soft" color="gray" disabled={page <= 1} onClick={() => onPage(page - 1)}>
            Previous page
          </Button>
          <Text size="2">
            Page <Mono size="2">{page}</Mono> of <Mono size="2">{pages}</Mono>
          </Text>
          <Button
            variant="soft"
            color="gray"
            disabled={page >= pages}
            onClick={() => onPage(page + 1)}
          >
            Next page
          </Button>
        </Flex>
      </nav>
    </Flex>
  );
}
