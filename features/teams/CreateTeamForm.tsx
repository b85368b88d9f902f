import { useState, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { TextField } from '@/components/TextField';
import { teamBodySchema } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { useCreateTeam } from './queries';

/** Start a team; you become its owner and it becomes the current team. */
export function CreateTeamForm(): ReactElement {
  const create = useCreateTeam();
  const [name, setName] = useState('');
  const { errors, submit } = useValidatedSubmit(
    teamBodySchema,
    (body) => create.mutate(body, { onSuccess: () => setName('') }),
    create.error,
  );
  const send = (): void => submit({ name });
  return (
    <>
      <TextField label="New team name" value={name} onChangeText={setName} onSubmitEditing={send} error={errors.name} />
      <FormError message={describeError(create.error)} />
      {create.data ? (
        <Banner tone="success" live>
          {`${create.data.name} is ready, with you as its owner.`}
        </Banner>
      ) : null}
      <Button label="Create team" variant="secondary" onPress={send} busy={create.isPending} />
    </>
  );
}
