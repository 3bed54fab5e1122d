import { Callout, Code, Text } from '@radix-ui/themes';
import { CrossIcon, WarningIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { ApiError, isApiUnreachable } from '@/lib/api-client';

/** Props of the API error callout. */
export interface ApiErrorCalloutProps {
  /** The error from a query or mutation. */
  error: unknown;
  /** What happens next on its own, e.g. "This page keeps trying every 2 s." */
  retryNote?: string;
}

/** Says in plain words what went wrong with an API call and what to do next. */
export function ApiErrorCallout({ error, retryNote }: ApiErrorCalloutProps) {
  if (isApiUnreachable(error)) {
    return (
      <Callout.Root color="red" role="alert" data-testid="api-unreachable">
        <Callout.Icon>
          <CrossIcon size={16} />
        </Callout.Icon>
        <Callout.Text weight="medium">Cannot reach the Overshoot API.</Callout.Text>
        <Callout.Text>
          Is <Code variant="ghost">npm start</Code> running? Start it from the project folder, then
          wait a few seconds.{retryNote ? ` ${retryNote}` : ''}
        </Callout.Text>
      </Callout.Root>
    );
  }
  const message = error instanceof Error ? error.message : String(error);
  return (
    <Callout.Root color="red" role="alert" data-testid="api-error">
      <Callout.Icon>
        <WarningIcon size={16} />
      </Callout.Icon>
      <Callout.Text>{message}</Callout.Text>
      {error instanceof ApiError ? (
        <Text as="p" size="1" color="gray">
          Code <Mono size="1">{error.code}</Mono>
          {error.status ? (
            <>
              {' '}
              · HTTP <Mono size="1">{error.status}</Mono>
            </>
          ) : null}
        </Text>
      ) : null}
      {retryNote ? <Callout.Text size="1">{retryNote}</Callout.Text> : null}
    </Callout.Root>
  );
}
