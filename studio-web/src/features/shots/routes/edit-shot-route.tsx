import { Flex, Heading } from '@radix-ui/themes';
import { useNavigate, useParams } from 'react-router-dom';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { useCurrentShow, usePermissions } from '@/features/auth';
import { useCharacters } from '@/features/library/api/get-characters';
import { useClips } from '@/features/library/api/get-clips';
import { QueryState } from '@/features/library/components/query-state';
import { useMembers } from '../api/get-members';
import { useShot } from '../api/get-shot';
import { useUpdateShot } from '../api/update-shot';
import { RoleNotice } from '../components/role-notice';
import { ShotForm } from '../components/shot-form';
import {
  changedFields,
  SHOT_FIELDS,
  shotToValues,
  type ShotField,
} from '../components/shot-form-values';

// Producers plan shots: due date and assignees only.
const PLAN_FIELDS: readonly ShotField[] = ['assigneeIds', 'dueDate'];

/** Edit a shot: every field for technical artists, due date and assignees for producers. */
export function EditShotRoute() {
  const { showId } = useCurrentShow();
  const shotId = useParams().shotId ?? '';
  const { can } = usePermissions();
  const navigate = useNavigate();
  const shot = useShot(showId, shotId);
  const characters = useCharacters(showId);
  const clips = useClips(showId);
  const members = useMembers(showId);
  const update = useUpdateShot(showId, shotId);
  const editable = can('editShot') ? SHOT_FIELDS : can('planShot') ? PLAN_FIELDS : [];
  const back = () => navigate(paths.shot.getHref(showId, shotId));
  return (
    <QueryState query={shot} what="the shot">
      {(s) => {
        const initial = shotToValues(s);
        return (
          <Flex direction="column" gap="4">
            <title>{`Edit ${s.code} · Overshoot`}</title>
            <Heading as="h1" size="7">
              Edit <Mono>{s.code}</Mono>
            </Heading>
            {editable.length === 0 ? (
              <RoleNotice>Your role may not change shots.</RoleNotice>
            ) : (
              <ShotForm
                key={s.id}
                initial={initial}
                editable={editable}
                characters={characters.data ?? []}
                clips={clips.data ?? []}
                members={members.data ?? []}
                submitLabel="Save changes"
                pending={update.isPending}
                error={update.error}
                onSubmit={(values) => {
                  const change = changedFields(initial, values, editable);
                  if (Object.keys(change).length === 0) return back();
                  update.mutate(change, { onSuccess: back });
                }}
                onCancel={back}
              />
            )}
          </Flex>
        );
      }}
    </QueryState>
  );
}
