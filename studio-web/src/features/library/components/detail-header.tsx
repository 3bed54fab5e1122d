import { Flex, Heading, Link as RadixLink, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

/** Props of a library page's header. */
export interface DetailHeaderProps {
  showId: string;
  /** The section of the library it belongs to, e.g. "Characters". */
  section: string;
  tab: string;
  title: ReactNode;
  /** State label and other badges beside the title. */
  badges?: ReactNode;
}

/** A library item page's header: a way back to its section, the title and its state. */
export function DetailHeader({ showId, section, tab, title, badges }: DetailHeaderProps) {
  return (
    <Flex direction="column" gap="2">
      <Text size="2">
        <RadixLink asChild>
          <Link to={`${paths.library.getHref(showId)}?tab=${tab}`}>← Library: {section}</Link>
        </RadixLink>
      </Text>
      <Flex align="center" gap="3" wrap="wrap">
        <Heading as="h1" size="7">
          {title}
        </Heading>
        {badges}
      </Flex>
    </Flex>
  );
}
