import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { ConfirmButton } from '@/components/ConfirmButton';
import { FormError } from '@/components/FormError';
import { SegmentedControl } from '@/components/SegmentedControl';
import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';
import type { Member } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';

import { useChangeMember, useRemoveMember } from './queries';
import { RoleBadge } from './RoleBadge';
import { roleOptions } from './roles';

export type MemberRowProps = { teamId: number; member: Member; selfId: number; canManage: boolean };

/** One member: name, address and role; owners can change the role or remove them. */
export function MemberRow({ teamId, member, selfId, canManage }: MemberRowProps): ReactElement {
  const change = useChangeMember(teamId);
  const remove = useRemoveMember(teamId, selfId);
  const isSelf = member.userId === selfId;
  return (
    <View style={styles.row}>
      <View style={styles.who}>
        <View style={styles.nameLine}>
          <Text weight="medium">{isSelf ? `${member.name} (you)` : member.name}</Text>
          {canManage ? null : <RoleBadge role={member.role} />}
        </View>
        <Text variant="small" tone="muted">
          {member.email}
        </Text>
      </View>
      {canManage ? (
        <View style={styles.controls}>
          <SegmentedControl
            label={`Role of ${member.name}`}
            hideLabel
            options={roleOptions}
            value={member.role}
            disabled={change.isPending}
            onChange={(role) => change.mutate({ userId: member.userId, change: { role } })}
          />
          {isSelf ? null : (
            <ConfirmButton
              label="Remove"
              question={`Remove ${member.name} from the team?`}
              confirmLabel="Remove"
              busy={remove.isPending}
              onConfirm={() => remove.mutate(member.userId)}
            />
          )}
        </View>
      ) : null}
      <FormError message={describeError(change.error ?? remove.error)} />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.sm, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  who: { gap: space.xxs },
  nameLine: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
  controls: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.md },
});
