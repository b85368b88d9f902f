import { useState, type ReactElement } from 'react';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { TextField } from '@/components/TextField';
import { teamBodySchema, type TeamSummary } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { useRenameTeam } from './queries';

export type RenameTeamFormProps = { team: TeamSummary };

/** Owners only: change the team's name. */
export function RenameTeamForm({ team }: RenameTeamFormProps): ReactElement {
  const rename = useRenameTeam(team.id);
  const [name, setName] = useState(team.name);
  const { errors, submit } = useValidatedSubmit(teamBodySchema, (body) => rename.mutate(body), rename.error);
  const send = (): void => submit({ name });
  return (
    <>
      <TextField label="Team name" value={name} onChangeText={setName} onSubmitEditing={send} error={errors.name} />
      <FormError message={describeError(rename.error)} />
      <Button label="Save name" variant="secondary" size="sm" onPress={send} busy={rename.isPending} disabled={name.trim() === team.name} />
    </>
  );
}
