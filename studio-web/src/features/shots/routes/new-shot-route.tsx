import { Flex, Heading, Text } from '@radix-ui/themes';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useCurrentShow, usePermissions } from '@/features/auth';
import { useCharacters } from '@/features/library/api/get-characters';
import { useClips } from '@/features/library/api/get-clips';
import { useCreateShot } from '../api/create-shot';
import { useMembers } from '../api/get-members';
import { RoleNotice } from '../components/role-notice';
import { ShotForm } from '../components/shot-form';
import { EMPTY_SHOT, SHOT_FIELDS, valuesToInput } from '../components/shot-form-values';

/** Create a shot. */
export function NewShotRoute() {
  const { showId } = useCurrentShow();
  const navigate = useNavigate();
  const { can } = usePermissions();
  const characters = useCharacters(showId);
  const clips = useClips(showId);
  const members = useMembers(showId);
  const create = useCreateShot(showId);
  return (
    <Flex direction="column" gap="4">
      <title>New shot · Overshoot</title>
      <Flex direction="column" gap="1">
        <Heading as="h1" size="7">
          New shot
        </Heading>
        <Text color="gray">A shot pairs a target character with a clip and a frame range.</Text>
      </Flex>
      {!can('createShot') ? (
        <RoleNotice>Your role may not create shots.</RoleNotice>
      ) : (
        <ShotForm
          initial={EMPTY_SHOT}
          editable={SHOT_FIELDS}
          characters={characters.data ?? []}
          clips={clips.data ?? []}
          members={members.data ?? []}
          submitLabel="Create shot"
          pending={create.isPending}
          error={create.error}
          onSubmit={(values) =>
            create.mutate(valuesToInput(values), {
              onSuccess: (shot) => navigate(paths.shot.getHref(showId, shot.id)),
            })
          }
          onCancel={() => navigate(paths.shots.getHref(showId))}
        />
      )}
    </Flex>
  );
}
