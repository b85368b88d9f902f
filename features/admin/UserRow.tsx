import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Badge } from '@/components/Badge';
import { Button } from '@/components/Button';
import { ConfirmButton } from '@/components/ConfirmButton';
import { FormError } from '@/components/FormError';
import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';
import type { AdminUser } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { formatDate } from '@/features/ui/formatDate';

import { useSetUserDisabled } from './queries';

export type UserRowProps = { user: AdminUser; isSelf: boolean };

/** One account with its state; disable (asks first) or enable it. */
export function UserRow({ user, isSelf }: UserRowProps): ReactElement {
  const setDisabled = useSetUserDisabled();
  const toggle = (disabled: boolean): void => setDisabled.mutate({ userId: user.id, disabled });
  return (
    <View style={styles.row}>
      <View style={styles.line}>
        <Text weight="medium">{isSelf ? `${user.name} (you)` : user.name}</Text>
        {user.isAdmin ? <Badge label="Admin" tone="accent" /> : null}
        {user.emailVerified ? null : <Badge label="Not confirmed" tone="neutral" />}
        {user.disabled ? <Badge label="Disabled" tone="danger" /> : null}
      </View>
      <Text variant="small" tone="muted">
        {`${user.email} · joined ${formatDate(user.createdAt)}`}
      </Text>
      {isSelf ? null : user.disabled ? (
        <Button label="Enable" variant="secondary" size="sm" busy={setDisabled.isPending} onPress={() => toggle(false)} />
      ) : (
        <ConfirmButton
          label="Disable"
          question={`Disable ${user.name}? They will be signed out and cannot sign in until enabled again.`}
          confirmLabel="Disable"
          busy={setDisabled.isPending}
          onConfirm={() => toggle(true)}
        />
      )}
      <FormError message={describeError(setDisabled.error)} />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  line: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
});
