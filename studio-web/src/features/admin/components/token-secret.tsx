import { Button, Callout, Code, Flex, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { CheckIcon, WarningIcon } from '@/components/ui/icons';
import type { CreatedToken } from '../api/pipeline-token';

type CopyState = 'idle' | 'copied' | 'failed';

/** A new token's secret, shown this once, with a copy button and a warning. */
export function TokenSecret({ token, onDone }: { token: CreatedToken; onDone: () => void }) {
  const [copy, setCopy] = useState<CopyState>('idle');
  const copySecret = async () => {
    try {
      await navigator.clipboard.writeText(token.secret);
      setCopy('copied');
    } catch {
      setCopy('failed');
    }
  };
  return (
    <Callout.Root color="amber" role="alert" data-testid="token-secret">
      <Callout.Icon>
        <WarningIcon size={16} />
      </Callout.Icon>
      <Flex direction="column" gap="3">
        <Callout.Text weight="medium">
          Copy the secret of “{token.name}” now: it is shown this once and cannot be read again.
        </Callout.Text>
        <Callout.Text size="2">
          Keep it in the pipeline’s secret store. Anyone holding it acts for this show with its
          scopes; revoke it here if it leaks.
        </Callout.Text>
        <Code size="3" variant="soft" className="token-secret" data-testid="token-secret-value">
          {token.secret}
        </Code>
        <Flex gap="3" align="center">
          <Button onClick={() => void copySecret()}>
            {copy === 'copied' ? <CheckIcon /> : null}
            {copy === 'copied' ? 'Copied' : 'Copy the secret'}
          </Button>
          <Button variant="soft" color="gray" onClick={onDone}>
            I have stored it
          </Button>
          {copy === 'failed' ? (
            <Text size="2" role="status">
              The browser did not allow copying: select the secret and copy it by hand.
            </Text>
          ) : null}
          {copy === 'copied' ? (
            <Text size="2" role="status" className="visually-hidden">
              The secret is on the clipboard.
            </Text>
          ) : null}
        </Flex>
      </Flex>
    </Callout.Root>
  );
}
