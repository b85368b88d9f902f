import { useRouter } from 'expo-router';
import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { Text } from '@/components/Text';
import { TextField } from '@/components/TextField';
import { space } from '@/components/theme';
import { MAX_RUN_REPLICATES, MAX_RUN_STEPS, startRunBodySchema } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { newSeed } from './newSeed';
import { useStartRun } from './queries';

export type StartRunFormProps = { scenario: { id: number; studyAreaId: number; yearsPerStep: number } };

/** Blank text is left out (the server's default); anything else goes as a number for the shared schema to judge. */
const numberOrAbsent = (text: string): number | undefined => (text.trim() === '' ? undefined : Number(text));

/** Start a run of a scenario (editors and owners): steps, years per step, replicates and a seed that is shown, editable and reusable. */
export function StartRunForm({ scenario }: StartRunFormProps): ReactElement {
  const router = useRouter();
  const start = useStartRun(scenario.id);
  const [steps, setSteps] = useState('50');
  const [yearsPerStep, setYearsPerStep] = useState(String(scenario.yearsPerStep));
  const [replicates, setReplicates] = useState('20');
  const [seed, setSeed] = useState(newSeed);
  const { errors, submit } = useValidatedSubmit(
    startRunBodySchema,
    (body) => start.mutate(body, { onSuccess: (run) => router.push(`/study-areas/${run.studyAreaId}/runs/${run.id}`) }),
    start.error,
  );
  const send = (): void => submit({ steps: numberOrAbsent(steps), yearsPerStep: numberOrAbsent(yearsPerStep), replicates: numberOrAbsent(replicates), seed: seed.trim() || undefined });
  return (
    <View style={styles.form}>
      <View style={styles.row}>
        <View style={styles.field}>
          <TextField label="Steps" value={steps} onChangeText={setSteps} inputMode="numeric" error={errors.steps} hint={`1 to ${MAX_RUN_STEPS.toLocaleString('en-US')}`} />
        </View>
        <View style={styles.field}>
          <TextField label="Years per step" value={yearsPerStep} onChangeText={setYearsPerStep} inputMode="decimal" error={errors.yearsPerStep} />
        </View>
        <View style={styles.field}>
          <TextField label="Replicates" value={replicates} onChangeText={setReplicates} inputMode="numeric" error={errors.replicates} hint={`1 to ${MAX_RUN_REPLICATES}`} />
        </View>
      </View>
      <View style={styles.seed}>
        <View style={styles.field}>
          <TextField label="Seed" value={seed} onChangeText={setSeed} error={errors.seed} hint="The same seed and inputs give the same result, byte for byte." />
        </View>
        <Button label="New seed" variant="secondary" size="sm" onPress={() => setSeed(newSeed())} />
      </View>
      <Text variant="small" tone="muted">
        The run keeps a copy of the scenario and start cover as they are now; later edits do not change it.
      </Text>
      <FormError message={describeError(start.error)} />
      <Button label="Start run" onPress={send} busy={start.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  seed: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.sm },
  field: { flexBasis: 150, flexGrow: 1 },
});
