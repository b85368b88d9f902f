import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Badge } from '@/components/Badge';
import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { Text } from '@/components/Text';
import { TextField } from '@/components/TextField';
import { space } from '@/components/theme';
import { updateAccountBodySchema, type User } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { useUpdateAccount } from './queries';

export type ProfileFormProps = { user: User };

/** Your e-mail address (fixed) and the name your team sees. */
export function ProfileForm({ user }: ProfileFormProps): ReactElement {
  const update = useUpdateAccount();
  const [name, setName] = useState(user.name);
  const { errors, submit } = useValidatedSubmit(updateAccountBodySchema, (body) => update.mutate(body), update.error);
  const send = (): void => submit({ name });
  return (
    <>
      <View style={styles.email}>
        <Text variant="label">E-mail address</Text>
        <View style={styles.line}>
          <Text>{user.email}</Text>
          <Badge label={user.emailVerified ? 'Confirmed' : 'Not confirmed'} tone={user.emailVerified ? 'primary' : 'danger'} />
        </View>
      </View>
      <TextField label="Name" value={name} onChangeText={setName} autoComplete="name" onSubmitEditing={send} error={errors.name} />
      <FormError message={describeError(update.error)} />
      {update.isSuccess && update.data.name === name.trim() ? (
        <Banner tone="success" live>
          Name saved.
        </Banner>
      ) : null}
      <Button label="Save name" variant="secondary" onPress={send} busy={update.isPending} disabled={name.trim() === user.name} />
    </>
  );
}

const styles = StyleSheet.create({
  email: { gap: space.xs },
  line: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
});
