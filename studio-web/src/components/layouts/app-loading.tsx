import { Flex, Spinner, Text } from '@radix-ui/themes';

/** Shown for the moment before the first page's data starts to arrive. */
export function AppLoading() {
  return (
    <Flex align="center" justify="center" gap="2" minHeight="50vh">
      <Spinner />
      <Text color="gray">Loading Overshoot…</Text>
    </Flex>
  );
}
