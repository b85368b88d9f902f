import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Rect } from 'react-native-svg';

import { Button } from '@/components/Button';
import { Card } from '@/components/Card';
import { Heading } from '@/components/Heading';
import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';
import type { GridSpec } from '@/shared/geo/grid';
import { localProjection } from '@/shared/geo/laea';
import type { AreaUnit, CoverState } from '@/shared/schemas';
import { formatArea } from '@/features/studyAreas/formatArea';

import { formatLatLon, plural } from './formatPlace';
import { patchPlace } from './patchGeometry';
import { patchStrip, stepsInState } from './patchHistory';

export type PatchInspectorProps = {
  patch: number;
  cell: number;
  areaM2: number;
  spec: GridSpec;
  coverStates: readonly CoverState[];
  lastStep: number;
  yearsPerStep: number;
  frameAt: (step: number) => Uint8Array | undefined;
  unit: AreaUnit;
  onClose: () => void;
};

const STRIP_HEIGHT = 22;

/** One patch: its state at every step as a strip, steps and years in each state, area and centre. */
export function PatchInspector({ patch, cell, areaM2, spec, coverStates, lastStep, yearsPerStep, frameAt, unit, onClose }: PatchInspectorProps): ReactElement {
  const strip = patchStrip(patch, lastStep, frameAt);
  const counts = stepsInState(strip, coverStates.length);
  const known = counts.reduce((sum, c) => sum + c, 0);
  const place = patchPlace(cell, spec, localProjection(spec.projection));
  const width = 100 / strip.length;
  return (
    <Card>
      <View style={styles.box} aria-label={`Patch ${patch}`} role="region">
        <Heading level={3}>{`Patch ${patch}`}</Heading>
        <Text variant="small" tone="muted">{`Row ${place.row}, column ${place.col} · ${formatArea(areaM2, unit)}`}</Text>
        <Text variant="mono">{`Cell centre ${formatLatLon(place.lat, place.lon)}`}</Text>
        <Text variant="tiny" tone="muted">{`(${Math.round(place.x)} m, ${Math.round(place.y)} m in the study area’s equal-area grid)`}</Text>
        <Text variant="label">{`State at each step (0–${lastStep})`}</Text>
        <Svg width="100%" height={STRIP_HEIGHT} viewBox={`0 0 100 ${STRIP_HEIGHT}`} preserveAspectRatio="none" aria-label="State at each step">
          {strip.map((state, step) => (
            <Rect key={step} x={step * width} y={0} width={width + 0.05} height={STRIP_HEIGHT} fill={state === null ? colors.line : coverStates[state]?.colour ?? colors.line} />
          ))}
        </Svg>
        {known < strip.length ? <Text variant="tiny" tone="muted">{`${strip.length - known} steps still loading`}</Text> : null}
        <View role="list" style={styles.list}>
          {coverStates.map((state, j) => (
            <View role="listitem" key={state.code} style={styles.row}>
              <View style={[styles.swatch, { backgroundColor: state.colour }]} />
              <Text variant="small" style={styles.name}>{state.name}</Text>
              <Text variant="mono">{`${plural(counts[j], 'step')} · ${plural(counts[j] * yearsPerStep, 'year')}`}</Text>
            </View>
          ))}
        </View>
        <Button label="Close patch" size="sm" variant="ghost" onPress={onClose} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  list: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  swatch: { width: 12, height: 12, borderWidth: 1, borderColor: colors.basalt },
  name: { flex: 1 },
});
