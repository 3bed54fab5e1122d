import { Box, Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { Logo } from '@/components/ui/logo';

/** Props of a signed-out page's card. */
export interface AuthPageProps {
  /** The page's heading (and its document title). */
  title: string;
  /** One sentence under the heading. */
  lead?: ReactNode;
  children: ReactNode;
}

/** The narrow centred card of sign-in, invitation and password pages. */
export function AuthPage({ title, lead, children }: AuthPageProps) {
  return (
    <Flex justify="center" pt={{ initial: '4', sm: '8' }}>
      <title>{`${title} · Overshoot`}</title>
      <Box width="100%" maxWidth="420px">
        <Card size="4">
          <Flex direction="column" gap="5">
            <Flex direction="column" gap="2">
              <Logo size={30} />
              <Heading as="h1" size="6">
                {title}
              </Heading>
              {lead ? <Text color="gray">{lead}</Text> : null}
            </Flex>
            {children}
          </Flex>
        </Card>
      </Box>
    </Flex>
  );
}
