import { useState, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { TextField } from '@/components/TextField';
import { NewPasswordField } from '@/components/NewPasswordField';
import { changePasswordBodySchema } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { useChangePassword } from './queries';

/** Change your password, confirming the current one. */
export function PasswordForm(): ReactElement {
  const change = useChangePassword();
  const [currentPassword, setCurrentPassword] = useState('');
  const [newPassword, setNewPassword] = useState('');
  const { errors, submit } = useValidatedSubmit(
    changePasswordBodySchema,
    (body) =>
      change.mutate(body, {
        onSuccess: () => {
          setCurrentPassword('');
          setNewPassword('');
        },
      }),
    change.error,
  );
  const send = (): void => submit({ currentPassword, newPassword });
  return (
    <>
      <TextField
        label="Current password"
        value={currentPassword}
        onChangeText={setCurrentPassword}
        secureTextEntry
        autoComplete="current-password"
        error={errors.currentPassword}
      />
      <NewPasswordField
        label="New password"
        value={newPassword}
        onChangeText={setNewPassword}
        onSubmitEditing={send}
        error={errors.newPassword}
      />
      <FormError message={describeError(change.error)} />
      {change.data ? (
        <Banner tone="success" live>
          {change.data.message}
        </Banner>
      ) : null}
      <Button label="Change password" variant="secondary" onPress={send} busy={change.isPending} />
    </>
  );
}
