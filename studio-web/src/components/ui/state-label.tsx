import { Badge, type BadgeProps } from '@radix-ui/themes';
import type { ReactNode } from 'react';

/** Props of a state label: the word is required, colour only backs it up. */
export interface StateLabelProps {
  /** Icon shown before the word (decorative). */
  icon: ReactNode;
  /** The state in words, e.g. "Up" or "Waiting in queue". */
  children: ReactNode;
  /** Badge colour; never the only carrier of meaning. */
  color?: BadgeProps['color'];
}

/** A state shown as an icon plus a word, never colour alone. */
export function StateLabel({ icon, children, color = 'gray' }: StateLabelProps) {
  return (
    <Badge color={color} variant="soft" size="2" radius="full">
      {icon}
      {children}
    </Badge>
  );
}
