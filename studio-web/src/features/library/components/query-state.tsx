import { Flex, Spinner, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';

/** Props of a query's waiting and error states. */
export interface QueryStateProps<T> {
  query: { data: T | undefined; error: unknown; isPending: boolean };
  /** What is loading, e.g. "characters". */
  what: string;
  children: (data: T) => ReactNode;
}

/** Shows a wait line, the error in plain words, or the data. */
export function QueryState<T>({ query, what, children }: QueryStateProps<T>) {
  if (query.data !== undefined) return <>{children(query.data)}</>;
  if (query.error) return <ApiErrorCallout error={query.error} />;
  return (
    <Flex align="center" gap="2">
      <Spinner />
      <Text color="gray">Loading {what}…</Text>
    </Flex>
  );
}
