import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, radius, space } from '@/components/theme';
import type { CoverState } from '@/shared/schemas';

export type StateTagProps = {
  state: CoverState;
  /** Also show the full name beside (or under, when `stacked`) the code. */
  withName?: boolean;
  stacked?: boolean;
};

/** A cover state as a colour swatch and its code: the colour helps, the text carries it. */
export function StateTag({ state, withName = false, stacked = false }: StateTagProps): ReactElement {
  return (
    <View style={[styles.tag, stacked && styles.stacked]}>
      <View style={styles.line}>
        <View style={[styles.swatch, { backgroundColor: state.colour }]} />
        <Text variant="small" weight="semibold">
          {state.code}
        </Text>
      </View>
      {withName ? (
        <Text variant={stacked ? 'tiny' : 'small'} tone="muted" numberOfLines={2}>
          {state.name}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  tag: { flexDirection: 'row', alignItems: 'center', gap: space.xs, flexShrink: 1 },
  stacked: { flexDirection: 'column', alignItems: 'flex-start', gap: 0 },
  line: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  swatch: { width: 12, height: 12, borderRadius: radius.sm, borderWidth: 1, borderColor: colors.basaltMuted },
});
