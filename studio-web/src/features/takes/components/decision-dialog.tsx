import { AlertDialog, Button, Flex, Text, TextArea } from '@radix-ui/themes';
import { useState } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { useCreateDecision } from '../api/create-decision';
import type { Decision } from '../api/note-view';

const WORDING: Record<
  Decision,
  { button: string; title: string; confirm: string; color: 'green' | 'orange' }
> = {
  approved: {
    button: 'Approve…',
    title: 'Approve this take?',
    confirm: 'Approve take',
    color: 'green',
  },
  changes_requested: {
    button: 'Request changes…',
    title: 'Request changes to this take?',
    confirm: 'Request changes',
    color: 'orange',
  },
};

/** Props of a decision button with its confirmation. */
export interface DecisionDialogProps {
  showId: string;
  takeId: string;
  version: number;
  decision: Decision;
  openNotes: number;
}

/** A decision button that asks for confirmation (and an optional comment) before it records. */
export function DecisionDialog({
  showId,
  takeId,
  version,
  decision,
  openNotes,
}: DecisionDialogProps) {
  const [open, setOpen] = useState(false);
  const [comment, setComment] = useState('');
  const create = useCreateDecision();
  const w = WORDING[decision];
  return (
    <AlertDialog.Root
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (!next) create.reset();
      }}
    >
      <AlertDialog.Trigger>
        <Button color={w.color} variant={decision === 'approved' ? 'solid' : 'soft'}>
          {w.button}
        </Button>
      </AlertDialog.Trigger>
      <AlertDialog.Content maxWidth="460px">
        <AlertDialog.Title>{w.title}</AlertDialog.Title>
        <AlertDialog.Description size="2">
          Take v{version} will be marked{' '}
          {decision === 'approved' ? 'approved' : 'as needing changes'}, and the people on the shot
          are told by e-mail. A decision cannot be taken back.
        </AlertDialog.Description>
        {openNotes > 0 && decision === 'approved' ? (
          <Text as="p" size="2" color="amber" mt="2">
            {openNotes} note{openNotes === 1 ? ' is' : 's are'} still open.
          </Text>
        ) : null}
        <Flex direction="column" gap="1" mt="3">
          <Text as="label" htmlFor={`decision-comment-${decision}`} size="2">
            Comment (optional)
          </Text>
          <TextArea
            id={`decision-comment-${decision}`}
            value={comment}
            onChange={(e) => setComment(e.target.value)}
            rows={3}
            maxLength={5000}
          />
        </Flex>
        {create.isError ? (
          <Flex mt="3">
            <ApiErrorCallout error={create.error} />
          </Flex>
        ) : null}
        <Flex gap="3" mt="4" justify="end">
          <AlertDialog.Cancel>
            <Button variant="soft" color="gray">
              Cancel
            </Button>
          </AlertDialog.Cancel>
          <Button
            color={w.color}
            loading={create.isPending}
            onClick={() =>
              create.mutate(
                {
                  showId,
                  takeId,
                  decision,
                  ...(comment.trim() ? { comment: comment.trim() } : {}),
                },
                { onSuccess: () => setOpen(false) },
              )
            }
          >
            {w.confirm}
          </Button>
        </Flex>
      </AlertDialog.Content>
    </AlertDialog.Root>
  );
}
