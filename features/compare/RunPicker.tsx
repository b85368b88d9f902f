import type { ReactElement } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, radius, space } from '@/components/theme';
import type { Run } from '@/shared/schemas';

import { COMPARE_LIMITS } from './runIds';

export type RunPickerProps = { runs: readonly Run[]; picked: readonly number[]; onToggle: (runId: number) => void };

/** The study area's finished runs as chips; picked ones are compared, the first picked is the reference. */
export function RunPicker({ runs, picked, onToggle }: RunPickerProps): ReactElement {
  const full = picked.length >= COMPARE_LIMITS.max;
  return (
    <View role="group" aria-label="Runs to compare" style={styles.row}>
      {runs.map((run) => {
        const on = picked.includes(run.id);
        const order = picked.indexOf(run.id);
        return (
          <Pressable
            key={run.id}
            role="checkbox"
            aria-checked={on}
            aria-disabled={!on && full}
            disabled={!on && full}
            onPress={() => onToggle(run.id)}
            style={[styles.chip, on && styles.on, !on && full && styles.disabled]}
          >
            <Text variant="small" weight="medium" tone={on ? 'inverse' : 'default'}>
              {`${on ? `${order + 1}. ` : ''}Run ${run.id} · ${run.inputs.scenarioName}`}
            </Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  chip: { minHeight: 36, justifyContent: 'center', paddingHorizontal: space.md, borderRadius: radius.pill, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  on: { backgroundColor: colors.sage, borderColor: colors.sage },
  disabled: { opacity: 0.55 },
});
