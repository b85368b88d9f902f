import { useMemo, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Path } from 'react-native-svg';

import { Text } from '@/components/Text';
import { colors, radius, space } from '@/components/theme';
import type { GridSpec } from '@/shared/geo/grid';
import type { CoverState } from '@/shared/schemas';

import { gridFrame, statePaths } from './stateMap';

export type StepMapProps = { label: string; spec: GridSpec; cells: Int32Array; frame: Uint8Array; states: readonly CoverState[] };

/** The patches at one step, one path per cover state in its colour. */
export function StepMap({ label, spec, cells, frame, states }: StepMapProps): ReactElement {
  const drawing = useMemo(() => {
    const box = gridFrame(spec);
    return { width: box.width, height: box.height, paths: statePaths(cells, frame, states.length, spec, box) };
  }, [spec, cells, frame, states.length]);
  return (
    <View style={styles.map}>
      <Text variant="label">{label}</Text>
      <View role="img" aria-label={`Map of the patches by cover state, ${label}`} style={[styles.box, { aspectRatio: drawing.width / drawing.height }]}>
        <Svg width="100%" height="100%" viewBox={`0 0 ${drawing.width} ${drawing.height}`}>
          {drawing.paths.map((d, j) => (d ? <Path key={states[j].code} d={d} fill={states[j].colour} /> : null))}
        </Svg>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  map: { flexGrow: 1, flexBasis: 220, gap: space.xs },
  box: { width: '100%', backgroundColor: colors.surface, borderRadius: radius.sm, borderWidth: 1, borderColor: colors.line },
});
