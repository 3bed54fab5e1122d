import { Button, Container, Flex, Heading, Text } from '@radix-ui/themes';
import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { paths } from '@/config/paths';

function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`.trim();
  if (error instanceof Error) return error.message;
  return String(error);
}

/** Shown when a page fails to load or render: a plain message and a way back. */
export function RouteError() {
  const error = useRouteError();
  return (
    <Container size="2" px="4" py="8">
      <Flex direction="column" gap="3" role="alert">
        <Heading as="h1" size="5">
          This page could not be shown.
        </Heading>
        <Text color="gray">Something went wrong while loading it: {describe(error)}</Text>
        <Flex gap="3">
          <Button onClick={() => window.location.reload()}>Reload the page</Button>
          <Button variant="soft" asChild>
            <Link to={paths.status.getHref()}>Go to Status</Link>
          </Button>
        </Flex>
      </Flex>
    </Container>
  );
}
