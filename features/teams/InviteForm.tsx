import { useState, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { SegmentedControl } from '@/components/SegmentedControl';
import { Text } from '@/components/Text';
import { TextField } from '@/components/TextField';
import { inviteBodySchema, type Role } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { useInvite } from './queries';
import { roleDescription, roleOptions } from './roles';

export type InviteFormProps = { teamId: number };

/** Owners only: e-mail someone an invitation with a role. */
export function InviteForm({ teamId }: InviteFormProps): ReactElement {
  const invite = useInvite(teamId);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('editor');
  const { errors, submit } = useValidatedSubmit(
    inviteBodySchema,
    (body) => invite.mutate(body, { onSuccess: () => setEmail('') }),
    invite.error,
  );
  const send = (): void => submit({ email, role });
  return (
    <>
      <TextField
        label="Invitee's e-mail"
        value={email}
        onChangeText={setEmail}
        keyboardType="email-address"
        autoComplete="off"
        error={errors.email}
      />
      <SegmentedControl label="Role" options={roleOptions} value={role} onChange={setRole} />
      <Text variant="small" tone="muted">
        {roleDescription[role]}
      </Text>
      <FormError message={describeError(invite.error)} />
      {invite.data ? (
        <Banner tone="success" live>
          {`Invitation sent to ${invite.data.email}.`}
        </Banner>
      ) : null}
      <Button label="Send invitation" onPress={send} busy={invite.isPending} />
    </>
  );
}
