import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import type { Run } from '@/shared/schemas';

import { runSettingsText } from './runSettings';

export type RunInputsProps = { run: Run };

const stepsText = (fromStep: number, toStep: number | null): string => (toStep === null ? `steps ${fromStep} on` : `steps ${fromStep}–${toStep}`);

/** What the run was made from, as frozen at its start: settings, fingerprint, start cover and each phase's matrix. */
export function RunInputs({ run }: RunInputsProps): ReactElement {
  const { inputs } = run;
  const codes = inputs.states.map((s) => s.code);
  return (
    <View style={styles.box}>
      <Text>{`${inputs.scenarioName} on ${inputs.studyAreaName}: ${inputs.patchCount.toLocaleString('en-US')} patches of ${inputs.cellSizeM} m`}</Text>
      <Text>{runSettingsText(run)}</Text>
      <Text variant="small" tone="muted">{`Start cover: ${inputs.startCover}`}</Text>
      <Text variant="mono" selectable>{`Fingerprint (SHA-256 of the frozen inputs and settings): ${run.fingerprint}`}</Text>
      {inputs.phases.map((phase, n) => (
        <View key={n} style={styles.phase}>
          <Text variant="label">{`Phase ${n + 1} (${stepsText(phase.fromStep, phase.toStep)}), from (rows) → to (columns) ${codes.join(' ')}`}</Text>
          {phase.matrix.map((row, i) => (
            <Text key={codes[i]} variant="mono">{`${codes[i].padEnd(6)} ${row.map((p) => p.toFixed(3)).join('  ')}`}</Text>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  phase: { gap: space.xxs, marginTop: space.sm },
});
