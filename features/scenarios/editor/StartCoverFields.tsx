import type { Dispatch, ReactElement } from 'react';
import { StyleSheet, TextInput, View } from 'react-native';

import { SegmentedControl } from '@/components/SegmentedControl';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { numberInput, space, typeScale } from '@/components/theme';
import type { CoverState } from '@/shared/schemas';
import { formatPercent } from '@/features/studyAreas/formatArea';

import { checkRow, checkCell, formatSum } from '../matrix-editor/cellCheck';
import { StateTag } from '../StateTag';
import type { ScenarioForm, ScenarioFormAction, StartCoverDraft } from './scenarioFormState';

export type StartCoverFieldsProps = {
  states: readonly CoverState[];
  form: ScenarioForm;
  dispatch: Dispatch<ScenarioFormAction>;
  readOnly: boolean;
  /** The study area's own start shares, or null when it has no start cover yet. */
  studyAreaShares: number[] | null;
  errors: string[];
};

const sources: ReadonlyArray<{ value: StartCoverDraft['source']; label: string }> = [
  { value: 'study-area', label: "The study area's" },
  { value: 'proportions', label: 'Own proportions' },
];

const methods = [
  { value: 'random', label: 'Each patch draws (seeded)' },
  { value: 'exact', label: 'Exact counts, shuffled' },
] as const;

/** Where step 0 comes from: the study area's start cover, or this scenario's own shares. */
export function StartCoverFields({ states, form, dispatch, readOnly, studyAreaShares, errors }: StartCoverFieldsProps): ReactElement {
  const { startCover } = form;
  const sum = startCover.source === 'proportions' ? checkRow(startCover.shares.map(checkCell)) : null;
  return (
    <Section title="Start cover" description="How patches are given states at step 0.">
      <SegmentedControl
        label="Start from"
        size="md"
        options={sources}
        value={startCover.source}
        disabled={readOnly}
        onChange={(source) => dispatch({ type: 'startSource', source })}
      />
      {startCover.source === 'study-area' ? (
        <Text variant="small" tone="muted">
          {studyAreaShares
            ? `The study area's start cover: ${states.map((s, i) => `${s.code} ${formatPercent(studyAreaShares[i])}`).join(', ')}.`
            : 'The study area has no start cover yet; the analysis uses equal shares until it has one.'}
        </Text>
      ) : (
        <>
          <SegmentedControl label="Assign" options={methods} value={startCover.method} disabled={readOnly} onChange={(method) => dispatch({ type: 'startMethod', method })} />
          <View style={styles.shares}>
            {states.map((state, i) => (
              <View key={state.code} style={styles.share}>
                <StateTag state={state} />
                <TextInput
                  value={startCover.shares[i]}
                  editable={!readOnly}
                  inputMode="decimal"
                  accessibilityLabel={`Start share of ${state.name}`}
                  onChangeText={(text) => dispatch({ type: 'startShare', index: i, text })}
                  style={styles.input}
                />
              </View>
            ))}
          </View>
          {sum ? (
            <Text variant="small" tone={sum.issue ? 'danger' : 'muted'}>
              {sum.issue ? `Shares: ${sum.issue.toLowerCase()}` : `Shares sum to ${formatSum(sum.sum)}.`}
            </Text>
          ) : null}
        </>
      )}
      {errors.map((error) => (
        <Text key={error} variant="small" tone="danger">
          {error}
        </Text>
      ))}
    </Section>
  );
}

const styles = StyleSheet.create({
  shares: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  share: { gap: space.xs },
  input: { ...numberInput, width: 96, minHeight: 44, paddingHorizontal: space.sm, ...typeScale.small },
});
