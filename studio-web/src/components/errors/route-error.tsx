import { Button, Container, Flex, Heading, Text } from '@radix-ui/themes';
import { isRouteErrorResponse, Link, Navigate, useLocation, useRouteError } from 'react-router-dom';
import { paths } from '@/config/paths';
import { isUnauthenticated } from '@/lib/query-client';

function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) {
    const text = typeof error.data === 'string' && error.data ? error.data : error.statusText;
    return `${error.status} ${text}`.trim();
  }
  if (error instanceof Error) return error.message;
  return String(error);
}

/** Shown when a page fails to load or render: a plain message and a way back. */
export function RouteError() {
  const error = useRouteError();
  const location = useLocation();
  // A page's loader met an ended session: sign in, then come back here.
  if (isUnauthenticated(error)) {
    const here = `${location.pathname}${location.search}${location.hash}`;
    return <Navigate to={paths.signIn.getHref(here)} replace />;
  }
  const forbidden = isRouteErrorResponse(error) && error.status === 403;
  return (
    <Container size="2" px="4" py="8">
      <Flex direction="column" gap="3" role="alert">
        <Heading as="h1" size="5">
          {forbidden ? 'This page is not open to your role.' : 'This page could not be shown.'}
        </Heading>
        <Text color="gray">
          {forbidden
            ? describe(error)
            : `Something went wrong while loading it: ${describe(error)}`}
        </Text>
        <Flex gap="3">
          {forbidden ? null : (
            <Button onClick={() => window.location.reload()}>Reload the page</Button>
          )}
          <Button variant="soft" asChild>
            <Link to={paths.home.getHref()}>Go to the start page</Link>
          </Button>
        </Flex>
      </Flex>
    </Container>
  );
}
