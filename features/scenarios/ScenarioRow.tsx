import { router } from 'expo-router';
import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Badge } from '@/components/Badge';
import { Button } from '@/components/Button';
import { ConfirmButton } from '@/components/ConfirmButton';
import { FormError } from '@/components/FormError';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { colors, space } from '@/components/theme';
import type { ScenarioSummary } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { formatDateTime } from '@/features/ui/formatDate';

import { useDeleteScenario, useDuplicateScenario } from './queries';

export type ScenarioRowProps = { scenario: ScenarioSummary; canChange: boolean };

/** One scenario in the list: name, phases, who changed it when; duplicate and delete for editors and owners. */
export function ScenarioRow({ scenario, canChange }: ScenarioRowProps): ReactElement {
  const duplicate = useDuplicateScenario();
  const remove = useDeleteScenario();
  const href = `/study-areas/${scenario.studyAreaId}/scenarios/${scenario.id}`;
  return (
    <View role="listitem" style={styles.row}>
      <View style={styles.text}>
        <TextLink href={href}>{scenario.name}</TextLink>
        <View style={styles.meta}>
          <Badge label={scenario.phaseCount === 1 ? '1 phase' : `${scenario.phaseCount} phases`} tone="info" />
          {scenario.surveyIds.length > 0 ? <Badge label="from a survey" tone="primary" /> : null}
          <Text variant="small" tone="muted">
            {`Updated by ${scenario.updatedBy}, ${formatDateTime(scenario.updatedAt)}`}
          </Text>
        </View>
      </View>
      {canChange ? (
        <View style={styles.actions}>
          <Button
            label="Duplicate"
            variant="secondary"
            size="sm"
            busy={duplicate.isPending}
            onPress={() => duplicate.mutate(scenario.id, { onSuccess: (copy) => router.push(`/study-areas/${copy.studyAreaId}/scenarios/${copy.id}`) })}
          />
          <ConfirmButton
            label="Delete"
            question={`Delete "${scenario.name}"? Its phases and matrices go with it.`}
            confirmLabel="Delete scenario"
            busy={remove.isPending}
            onConfirm={() => remove.mutate(scenario.id)}
          />
        </View>
      ) : null}
      <FormError message={describeError(duplicate.error ?? remove.error)} />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.sm, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  text: { gap: space.xs },
  meta: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
