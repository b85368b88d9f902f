import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';
import type { Invitation } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { formatDate } from '@/features/ui/formatDate';

import { useCancelInvitation } from './queries';
import { RoleBadge } from './RoleBadge';

export type PendingInvitationsProps = { teamId: number; invitations: Invitation[] };

/** Owners only: invitations not yet accepted, each with a way to withdraw it. */
export function PendingInvitations({ teamId, invitations }: PendingInvitationsProps): ReactElement {
  const cancel = useCancelInvitation(teamId);
  if (invitations.length === 0) {
    return (
      <Text variant="small" tone="muted">
        No invitations waiting.
      </Text>
    );
  }
  return (
    <View>
      {invitations.map((invitation) => (
        <View key={invitation.id} style={styles.row}>
          <View style={styles.who}>
            <View style={styles.line}>
              <Text weight="medium">{invitation.email}</Text>
              <RoleBadge role={invitation.role} />
            </View>
            <Text variant="small" tone="muted">
              {`Invited by ${invitation.invitedBy} · expires ${formatDate(invitation.expiresAt)}`}
            </Text>
          </View>
          <Button
            label="Cancel invitation"
            variant="ghost"
            size="sm"
            busy={cancel.isPending && cancel.variables === invitation.id}
            onPress={() => cancel.mutate(invitation.id)}
          />
        </View>
      ))}
      <FormError message={describeError(cancel.error)} />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  who: { gap: space.xxs },
  line: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
});
