import { useMemo, type ReactElement } from 'react';
import { G, Path } from 'react-native-svg';

import { colors } from '@/components/theme';

import { statePaths } from './mapPaths';
import type { PatchLayerProps } from './patchLayerTypes';

/** The patches as one filled path per cover state. */
export function StatePathsLayer({ drawing, coverStates, states }: PatchLayerProps): ReactElement {
  const { cells, spec, frame } = drawing;
  const paths = useMemo(() => statePaths(cells, states, coverStates.length, spec, frame), [cells, states, coverStates.length, spec, frame]);
  return <G>{paths.map((d, j) => (d ? <Path key={coverStates[j]?.code ?? j} d={d} fill={coverStates[j]?.colour ?? colors.line} /> : null))}</G>;
}
