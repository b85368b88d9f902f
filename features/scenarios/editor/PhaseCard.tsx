import { useCallback, type Dispatch, type ReactElement } from 'react';
import { StyleSheet, TextInput, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { Card } from '@/components/Card';
import { Heading } from '@/components/Heading';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { numberInput, space, typeScale } from '@/components/theme';
import type { CoverState } from '@/shared/schemas';

import { MatrixEditor } from '../matrix-editor/MatrixEditor';
import type { MatrixEditorAction, MatrixReading } from '../matrix-editor/matrixEditorState';
import type { PhaseDraft, ScenarioFormAction } from './scenarioFormState';

export type PhaseCardProps = {
  index: number;
  phase: PhaseDraft;
  /** First step (from the phase before); NaN while that end is not a number. */
  start: number;
  isLast: boolean;
  canRemove: boolean;
  states: readonly CoverState[];
  reading: MatrixReading;
  dispatch: Dispatch<ScenarioFormAction>;
  readOnly: boolean;
  /** Reasons this phase was not saved (the browser's, then the server's). */
  issues: readonly string[];
  studyAreaId: number;
  fileName: string;
};

/** One phase: its step range, where its matrix came from, and its matrix editor. */
export function PhaseCard({ index, phase, start, isLast, canRemove, states, reading, dispatch, readOnly, issues, studyAreaId, fileName }: PhaseCardProps): ReactElement {
  const matrixDispatch = useCallback((action: MatrixEditorAction) => dispatch({ type: 'phaseMatrix', index, action }), [dispatch, index]);
  const startText = Number.isFinite(start) ? String(start) : '?';
  return (
    <Card>
      <View role="group" aria-label={`Phase ${index + 1}`} style={styles.box}>
        <View style={styles.head}>
          <Heading level={2}>{`Phase ${index + 1}`}</Heading>
          {canRemove && !readOnly ? <Button label="Remove phase" variant="ghost" size="sm" onPress={() => dispatch({ type: 'removePhase', index })} /> : null}
        </View>
        <View style={styles.range}>
          <Text>{`From step ${startText}`}</Text>
          {isLast ? (
            <Text>to the end of the run</Text>
          ) : (
            <>
              <Text>to step</Text>
              <TextInput
                value={phase.endText}
                editable={!readOnly}
                inputMode="numeric"
                accessibilityLabel={`Phase ${index + 1} ends at step`}
                onChangeText={(text) => dispatch({ type: 'phaseEnd', index, text })}
                style={styles.input}
              />
            </>
          )}
        </View>
        {phase.survey ? (
          <View style={styles.survey}>
            <Text variant="small">
              {'Estimated from the survey '}
              <TextLink href={`/study-areas/${studyAreaId}/surveys/${phase.survey.id}`}>{phase.survey.name}</TextLink>
            </Text>
            {readOnly ? null : <Button label="Unlink survey" variant="ghost" size="sm" onPress={() => dispatch({ type: 'unlinkSurvey', index })} />}
          </View>
        ) : (
          <Text variant="small" tone="muted">
            Typed in.{' '}
            {readOnly ? null : <TextLink href={`/study-areas/${studyAreaId}/surveys`}>Estimate it from a survey</TextLink>}
          </Text>
        )}
        {issues.length > 0 ? (
          <Banner tone="danger" title="Not saved" live>
            <View style={styles.issues}>
              {issues.map((issue) => (
                <Text key={issue} variant="small">
                  {`• ${issue}`}
                </Text>
              ))}
            </View>
          </Banner>
        ) : null}
        <MatrixEditor states={states} editor={phase.matrix} reading={reading} dispatch={matrixDispatch} readOnly={readOnly} fileName={fileName} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  range: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
  survey: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
  issues: { gap: space.xxs },
  input: { ...numberInput, width: 72, minHeight: 44, paddingHorizontal: space.sm, ...typeScale.body },
});
