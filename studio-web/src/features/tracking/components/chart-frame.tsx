import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

/** Props of a chart's card. */
export interface ChartFrameProps {
  title: string;
  /** The chart's message in one sentence, for everyone (and screen readers in place of bars). */
  summary: string;
  children: ReactNode;
}

/** A titled card around a chart, with its message written out under the title. */
export function ChartFrame({ title, summary, children }: ChartFrameProps) {
  return (
    <Card size="2" asChild>
      <figure style={{ margin: 0 }}>
        <Flex direction="column" gap="3">
          <Flex direction="column" gap="1">
            <Heading as="h3" size="3">
              {title}
            </Heading>
            <Text as="p" size="2" color="gray" asChild>
              <figcaption>{summary}</figcaption>
            </Text>
          </Flex>
          {children}
        </Flex>
      </figure>
    </Card>
  );
}
