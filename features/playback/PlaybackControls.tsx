import Slider from '@react-native-community/slider';
import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';

import { SPEED_LIMITS, usePlaybackStore } from './store';
import { stepLabel } from './stepLabel';

export type PlaybackControlsProps = { yearsPerStep: number };

/** Play and pause, step back and forward, the time slider with its step and year, and the speed. */
export function PlaybackControls({ yearsPerStep }: PlaybackControlsProps): ReactElement {
  const { step, lastStep, playing, speed, setStep, stepBy, setPlaying, setSpeed } = usePlaybackStore();
  return (
    <View style={styles.box}>
      <View style={styles.row}>
        <Button label={playing ? 'Pause' : 'Play'} onPress={() => setPlaying(!playing)} />
        <Button label="Step back" variant="secondary" onPress={() => stepBy(-1)} disabled={step === 0} />
        <Button label="Step forward" variant="secondary" onPress={() => stepBy(1)} disabled={step >= lastStep} />
        <Text variant="mono" aria-live="polite" testID="step-label" style={styles.label}>
          {stepLabel(step, yearsPerStep)}
        </Text>
      </View>
      <Slider
        accessibilityLabel="Step"
        minimumValue={0}
        maximumValue={lastStep}
        step={1}
        value={step}
        onValueChange={setStep}
        minimumTrackTintColor={colors.sage}
        maximumTrackTintColor={colors.line}
        thumbTintColor={colors.sageDark}
      />
      <View style={styles.row}>
        <Text variant="small" style={styles.speedLabel}>{`Speed: ${speed} steps per second`}</Text>
        <View style={styles.speed}>
          <Slider
            accessibilityLabel="Speed in steps per second"
            minimumValue={SPEED_LIMITS.min}
            maximumValue={SPEED_LIMITS.max}
            step={1}
            value={speed}
            onValueChange={setSpeed}
            minimumTrackTintColor={colors.ochre}
            maximumTrackTintColor={colors.line}
            thumbTintColor={colors.ochre}
          />
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  label: { marginLeft: 'auto' },
  speedLabel: { minWidth: 190 },
  speed: { flex: 1, minWidth: 140 },
});
