import { Flex, Heading, Text } from '@radix-ui/themes';
import { useSession } from '@/features/auth/hooks/use-session';
import { ShowList } from '@/features/shows/components/show-list';

/** The show picker page: every show the user belongs to. */
export function ShowsRoute() {
  const { user } = useSession();
  return (
    <Flex direction="column" gap="5">
      <title>Shows · Overshoot</title>
      <Flex direction="column" gap="1">
        <Heading as="h1" size="7">
          Shows
        </Heading>
        <Text color="gray">Signed in as {user.displayName}. Choose the show to work in.</Text>
      </Flex>
      <ShowList />
    </Flex>
  );
}
