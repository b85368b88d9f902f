import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { formatDate } from '@/features/ui/formatDate';

import { useAuditLog } from './queries';

export type AuditLogProps = { teamId: number };

/** Owners only: who changed membership or roles, or deleted something, and when. */
export function AuditLog({ teamId }: AuditLogProps): ReactElement {
  const log = useAuditLog(teamId, true);
  if (log.isError) return <QueryErrorState error={log.error} what="the activity log" onRetry={() => void log.refetch()} />;
  const events = log.data ?? [];
  if (events.length === 0) {
    return (
      <Text variant="small" tone="muted">
        {log.isPending ? 'Loading…' : 'Nothing recorded yet.'}
      </Text>
    );
  }
  return (
    <View>
      {events.map((event) => (
        <View key={event.id} style={styles.row}>
          <Text>{`${event.actor} ${event.summary}`}</Text>
          <Text variant="small" tone="muted">
            {formatDate(event.at)}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: space.sm, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.line },
});
