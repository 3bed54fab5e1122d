import { Card, Flex, Heading, Separator, Text } from '@radix-ui/themes';
import { Mono } from '@/components/ui/mono';
import { useDecisions } from '../api/get-decisions';
import { useNotes } from '../api/get-notes';
import type { MarkPoint, Note } from '../api/note-view';
import type { Take } from '../api/take-view';
import { DecisionDialog } from './decision-dialog';
import { NoteForm } from './note-form';
import { NotesPanel } from './notes-panel';
import { ReviewStateLabel } from './review-state-label';

/** Props of the review panel. */
export interface ReviewPanelProps {
  showId: string;
  take: Take;
  shotFrame: number;
  userId: string;
  isAdmin: boolean;
  canWrite: boolean;
  canResolve: boolean;
  canDecide: boolean;
  drawing: boolean;
  onDrawingChange: (drawing: boolean) => void;
  draft: MarkPoint[][];
  onDraftChange: (strokes: MarkPoint[][]) => void;
  onJump: (note: Note) => void;
}

const when = (iso: string) => new Date(iso).toLocaleString();

/** Review: the decision, the notes pinned to frames and a form for a new one. */
export function ReviewPanel(props: ReviewPanelProps) {
  const { showId, take, shotFrame, canWrite, canDecide } = props;
  const decisions = useDecisions(showId, take.id);
  const notes = useNotes(showId, take.id);
  const openNotes = (notes.data ?? []).filter((n) => !n.resolved).length;
  const decidable =
    canDecide && take.reviewState === 'awaiting_review' && take.solveState === 'solved';
  return (
    <Card asChild>
      <section aria-labelledby="review-heading" data-testid="review-panel">
        <Flex direction="column" gap="3">
          <Flex justify="between" align="center" gap="2" wrap="wrap">
            <Heading as="h2" size="4" id="review-heading">
              Review
            </Heading>
            <ReviewStateLabel state={take.reviewState} testId="review-state" />
          </Flex>
          {decidable ? (
            <Flex gap="2" data-testid="decision-actions">
              <DecisionDialog
                showId={showId}
                takeId={take.id}
                version={take.version}
                decision="approved"
                openNotes={openNotes}
              />
              <DecisionDialog
                showId={showId}
                takeId={take.id}
                version={take.version}
                decision="changes_requested"
                openNotes={openNotes}
              />
            </Flex>
          ) : null}
          {(decisions.data ?? []).map((d) => (
            <Text as="p" size="1" color="gray" key={d.id} data-testid="decision-line">
              {d.decision === 'approved' ? 'Approved' : 'Changes requested'} by{' '}
              {d.supervisor.displayName}, <Mono size="1">{when(d.at)}</Mono>
              {d.comment ? `: “${d.comment}”` : ''}
            </Text>
          ))}
          <Separator size="4" />
          <NotesPanel
            showId={showId}
            takeId={take.id}
            shotFrame={shotFrame}
            userId={props.userId}
            isAdmin={props.isAdmin}
            canResolve={props.canResolve}
            onJump={props.onJump}
          />
          {canWrite ? (
            <>
              <Separator size="4" />
              <NoteForm
                showId={showId}
                takeId={take.id}
                shotFrame={shotFrame}
                drawing={props.drawing}
                onDrawingChange={props.onDrawingChange}
                draft={props.draft}
                onDraftChange={props.onDraftChange}
              />
            </>
          ) : null}
        </Flex>
      </section>
    </Card>
  );
}
