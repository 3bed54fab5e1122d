import { Text, type TextProps } from '@radix-ui/themes';

/** Text set in JetBrains Mono with even-width digits: numbers, latencies, codes, frame counters. */
export function Mono({ className, ...props }: TextProps) {
  return <Text {...props} className={className ? `mono ${className}` : 'mono'} />;
}
