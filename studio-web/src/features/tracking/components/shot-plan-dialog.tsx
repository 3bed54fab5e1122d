import {
  Button,
  Checkbox,
  Dialog,
  Flex,
  RadioGroup,
  ScrollArea,
  Text,
  TextField,
} from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { FormField } from '@/components/ui/form-field';
import { Mono } from '@/components/ui/mono';
import { RenderStateLabel } from '@/components/ui/shot-state-labels';
import { useShowMembers } from '@/features/shows';
import { todayUtc } from '@/lib/dates';
import { RENDER_MOVES, type RenderState } from '@/lib/shot-states';
import { useSetRenderState } from '../api/set-render-state';
import type { TrackedShot } from '../api/tracked-shot';
import { useUpdateShotPlan, type ShotPlanChange } from '../api/update-shot-plan';
import { planErrors } from './plan-errors';

/** Props of a shot's update dialog. */
export interface ShotPlanDialogProps {
  showId: string;
  shot: TrackedShot;
  /** May set the due date and assignees. */
  canPlan: boolean;
  /** May set the render state by hand. */
  canRender: boolean;
}

const sameIds = (a: readonly string[], b: readonly string[]) =>
  a.length === b.length && a.every((id) => b.includes(id));

function PlanForm({
  showId,
  shot,
  canPlan,
  canRender,
  onDone,
}: ShotPlanDialogProps & { onDone: () => void }) {
  const members = useShowMembers(showId);
  const plan = useUpdateShotPlan();
  const render = useSetRenderState();
  const [dueDate, setDueDate] = useState(shot.dueDate ?? '');
  const [assigneeIds, setAssigneeIds] = useState(() => shot.assignees.map((a) => a.id));
  const [renderState, setRenderState] = useState<RenderState>(shot.renderState);
  const errors = planErrors(plan.error, render.error);
  const pending = plan.isPending || render.isPending;
  // Disabled members stay listed while they hold the shot, so they can be taken off it.
  const people = (members.data ?? []).filter((m) => !m.disabled || assigneeIds.includes(m.userId));
  const renderChoices: RenderState[] = [shot.renderState, ...RENDER_MOVES[shot.renderState]];

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    plan.reset();
    render.reset();
    const change: ShotPlanChange = {};
    if (canPlan && dueDate !== (shot.dueDate ?? '')) change.dueDate = dueDate || null;
    const held = shot.assignees.map((a) => a.id);
    if (canPlan && !sameIds(assigneeIds, held)) change.assigneeIds = assigneeIds;
    try {
      if (Object.keys(change).length > 0) {
        await plan.mutateAsync({ showId, shotId: shot.id, change });
      }
      if (canRender && renderState !== shot.renderState) {
        await render.mutateAsync({ showId, shotId: shot.id, state: renderState });
      }
      onDone();
    } catch {
      // The mutations keep their errors; the form shows them under the fields.
    }
  };

  return (
    <form onSubmit={submit} noValidate aria-label={`Update ${shot.code}`}>
      <Flex direction="column" gap="4">
        {canPlan ? (
          <FormField
            label="Due date"
            hint={
              dueDate && dueDate < todayUtc()
                ? 'In the past: the shot counts as late until its latest take is approved.'
                : 'Leave empty for no due date.'
            }
            error={errors.fields.dueDate}
          >
            {(control) => (
              <Flex gap="2" align="center">
                <TextField.Root
                  {...control}
                  type="date"
                  className="mono"
                  value={dueDate}
                  onChange={(e) => setDueDate(e.target.value)}
                  data-testid="plan-due-date"
                />
                <Button
                  type="button"
                  variant="ghost"
                  color="gray"
                  disabled={dueDate === ''}
                  onClick={() => setDueDate('')}
                >
                  No due date
                </Button>
              </Flex>
            )}
          </FormField>
        ) : null}
        {canPlan ? (
          <FormField label="Assignees" error={errors.fields.assigneeIds}>
            {(control) => (
              <ScrollArea type="auto" scrollbars="vertical" style={{ maxHeight: 168 }}>
                <Flex
                  direction="column"
                  gap="1"
                  role="group"
                  id={control.id}
                  aria-describedby={control['aria-describedby']}
                  pr="3"
                >
                  {members.isPending ? (
                    <Text size="2" color="gray">
                      Loading the show’s members…
                    </Text>
                  ) : null}
                  {members.data && people.length === 0 ? (
                    <Text size="2" color="gray">
                      No members to assign.
                    </Text>
                  ) : null}
                  {people.map((m) => (
                    <Text as="label" size="2" key={m.userId}>
                      <Flex gap="2" align="center">
                        <Checkbox
                          checked={assigneeIds.includes(m.userId)}
                          onCheckedChange={(on) =>
                            setAssigneeIds((ids) =>
                              on === true
                                ? [...ids, m.userId]
                                : ids.filter((id) => id !== m.userId),
                            )
                          }
                        />
                        {m.displayName}
                        {m.disabled ? (
                          <Text size="1" color="gray">
                            (account disabled)
                          </Text>
                        ) : null}
                      </Flex>
                    </Text>
                  ))}
                </Flex>
              </ScrollArea>
            )}
          </FormField>
        ) : null}
        {canRender ? (
          <FormField
            label="Render state"
            hint="Set by hand when the render farm does not report it."
            error={errors.fields.renderState}
          >
            {(control) => (
              <RadioGroup.Root
                {...control}
                value={renderState}
                onValueChange={(v) => setRenderState(v as RenderState)}
                aria-label="Render state"
              >
                {renderChoices.map((s) => (
                  <RadioGroup.Item key={s} value={s} data-testid={`plan-render-${s}`}>
                    <Flex gap="2" align="center">
                      <RenderStateLabel state={s} />
                      {s === shot.renderState ? (
                        <Text size="1" color="gray">
                          now
                        </Text>
                      ) : null}
                    </Flex>
                  </RadioGroup.Item>
                ))}
              </RadioGroup.Root>
            )}
          </FormField>
        ) : null}
        {errors.rest ? <ApiErrorCallout error={errors.rest} /> : null}
        <Flex gap="3" justify="end">
          <Dialog.Close>
            <Button type="button" variant="soft" color="gray">
              Cancel
            </Button>
          </Dialog.Close>
          <Button type="submit" loading={pending} data-testid="plan-save">
            Save
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}

/** A row's "Update…" button and its dialog: due date, assignees and render state of a shot. */
export function ShotPlanDialog(props: ShotPlanDialogProps) {
  const { shot, canPlan, canRender } = props;
  const [open, setOpen] = useState(false);
  const what =
    canPlan && canRender
      ? 'Set its due date and who holds it, or move its render state by hand.'
      : canPlan
        ? 'Set its due date and who holds it.'
        : 'Move its render state by hand.';
  return (
    <Dialog.Root open={open} onOpenChange={setOpen}>
      <Dialog.Trigger>
        <Button size="1" variant="soft" color="gray" data-testid="update-shot">
          Update…<span className="visually-hidden"> {shot.code}</span>
        </Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="440px" data-testid="shot-plan-dialog">
        <Dialog.Title>
          Update <Mono size="5">{shot.code}</Mono>
        </Dialog.Title>
        <Dialog.Description size="2" color="gray" mb="4">
          {what}
        </Dialog.Description>
        {open ? <PlanForm {...props} onDone={() => setOpen(false)} /> : null}
      </Dialog.Content>
    </Dialog.Root>
  );
}
