import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { colors, space } from '@/components/theme';
import type { Run } from '@/shared/schemas';
import { formatDateTime } from '@/features/ui/formatDate';

import { ProgressBar } from './ProgressBar';
import { RunStatusBadge } from './RunStatusBadge';
import { runSettingsText } from './runSettings';

export type RunRowProps = { run: Run };

/** One run in a study area's list: scenario, status, who and when, settings, progress. */
export function RunRow({ run }: RunRowProps): ReactElement {
  return (
    <View role="listitem" style={styles.row}>
      <View style={styles.title}>
        <TextLink href={`/study-areas/${run.studyAreaId}/runs/${run.id}`}>{`Run ${run.id} · ${run.inputs.scenarioName}`}</TextLink>
        <RunStatusBadge status={run.status} />
      </View>
      <Text variant="small" tone="muted">{`${run.createdBy} · ${formatDateTime(run.createdAt)}`}</Text>
      <Text variant="small">{runSettingsText(run)}</Text>
      <ProgressBar run={run} />
      {run.error ? (
        <Text variant="small" tone="danger">
          {run.error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs, paddingVertical: space.md, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.line },
  title: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
