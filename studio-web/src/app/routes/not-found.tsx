import { Flex, Heading, Link as ThemeLink, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

/** Any address the studio does not have: a plain message and a way back. */
export function NotFoundRoute() {
  return (
    <Flex direction="column" gap="3">
      <title>Page not found · Overshoot</title>
      <Heading as="h1" size="6">
        Page not found
      </Heading>
      <Text color="gray">There is no page at this address.</Text>
      <Text>
        <ThemeLink asChild>
          <Link to={paths.status.getHref()}>Go to Status</Link>
        </ThemeLink>
      </Text>
    </Flex>
  );
}
