import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { SegmentedControl } from '@/components/SegmentedControl';
import { Text } from '@/components/Text';
import { TextField } from '@/components/TextField';
import { space } from '@/components/theme';
import type { ProportionsStartCoverBody, StartCoverSummary, StudyAreaDetail } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';

import { checkPercents, initialPercents } from './proportions';
import { useSaveProportions } from './queries';

export type ProportionsFormProps = { studyArea: StudyAreaDetail; startCover: StartCoverSummary | null };

type Method = ProportionsStartCoverBody['method'];

const METHODS: ReadonlyArray<{ value: Method; label: string; explain: string }> = [
  { value: 'random', label: 'Random draw', explain: 'Each patch draws its state with these chances; the shares come out close, not exact.' },
  { value: 'exact', label: 'Exact counts', explain: 'Patch counts are the shares rounded, then shuffled over the patches.' },
];

/** A start cover from one share per state, assigned with a seed that is always shown and reusable (the panel remounts it with the saved seed). */
export function ProportionsForm({ studyArea, startCover }: ProportionsFormProps): ReactElement {
  const save = useSaveProportions(studyArea.id);
  const [percents, setPercents] = useState(() => initialPercents(studyArea.states.length, startCover?.proportions ?? null));
  const [method, setMethod] = useState<Method>(startCover?.method === 'exact' ? 'exact' : 'random');
  const [seed, setSeed] = useState(startCover?.seed ?? '');
  const check = checkPercents(percents);
  const send = (): void => {
    if (!check.proportions) return;
    save.mutate({ method, proportions: check.proportions, ...(seed.trim() ? { seed: seed.trim() } : {}) });
  };
  return (
    <>
      <View style={styles.shares}>
        {studyArea.states.map((state, i) => (
          <View key={state.code} style={styles.share}>
            <TextField
              label={`${state.name} (%)`}
              value={percents[i]}
              keyboardType="numeric"
              onChangeText={(text) => setPercents(percents.map((p, j) => (j === i ? text : p)))}
            />
          </View>
        ))}
      </View>
      <Text variant="mono" tone={check.message ? 'danger' : 'primary'} role="status">
        {`Sum: ${Number.isFinite(check.sum) ? check.sum.toFixed(1) : '—'} %`}
      </Text>
      {check.message ? (
        <Text variant="small" tone="danger">
          {check.message}
        </Text>
      ) : null}
      <SegmentedControl label="Assignment" options={METHODS} value={method} onChange={setMethod} />
      {METHODS.map((m) => (
        <Text key={m.value} variant="small" tone={m.value === method ? 'default' : 'muted'}>
          {`${m.label}: ${m.explain}`}
        </Text>
      ))}
      <TextField label="Seed" value={seed} onChangeText={setSeed} hint="Leave empty for a new random seed; the same seed gives the same start cover." />
      <FormError message={describeError(save.error)} />
      <Button label="Save start cover" onPress={send} busy={save.isPending} disabled={!check.proportions} />
    </>
  );
}

const styles = StyleSheet.create({
  shares: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  share: { flexBasis: 150, flexGrow: 1 },
});
