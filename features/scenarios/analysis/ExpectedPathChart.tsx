import { useState, type ReactElement } from 'react';
import { View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Polyline, Text as SvgText } from 'react-native-svg';

import { colors, fonts } from '@/components/theme';
import type { CoverState } from '@/shared/schemas';

import { spreadLabels } from './spreadLabels';

export type ExpectedPathChartProps = {
  states: readonly CoverState[];
  /** x_t per state, t = 0…T (area shares). */
  path: readonly (readonly number[])[];
  /** Steps where a later phase begins, marked with a thin line. */
  phaseStarts: readonly number[];
};

const HEIGHT = 220;
const PAD = { top: 10, right: 118, bottom: 28, left: 40 };
/** Line patterns cycle with the states, so lines differ without colour too. */
const DASHES = ['', '6 3', '2 3', '10 3 2 3', '1 5', '8 6'];

const percent = (share: number): string => `${Math.round(share * 100)} %`;

/** The expected path x_t of each state's share: one line per state, labelled at its end with code and share. */
export function ExpectedPathChart({ states, path, phaseStarts }: ExpectedPathChartProps): ReactElement {
  const [width, setWidth] = useState(0);
  const onLayout = (event: LayoutChangeEvent): void => setWidth(Math.round(event.nativeEvent.layout.width));
  const steps = path.length - 1;
  const plotW = Math.max(0, width - PAD.left - PAD.right);
  const plotH = HEIGHT - PAD.top - PAD.bottom;
  const x = (t: number): number => PAD.left + (steps === 0 ? 0 : (t / steps) * plotW);
  const y = (share: number): number => PAD.top + (1 - share) * plotH;
  const last = path[steps];
  const labelY = spreadLabels(last.map(y), 14, PAD.top + 4, PAD.top + plotH);
  const summary = states.map((state, j) => `${state.name} ${percent(path[0][j])} to ${percent(last[j])}`).join('; ');
  return (
    <View onLayout={onLayout} role="img" aria-label={`Expected share of each state over ${steps} steps: ${summary}`}>
      {width > 0 ? (
        <Svg width={width} height={HEIGHT}>
          {[0, 0.5, 1].map((share) => (
            <G key={share}>
              <Line x1={PAD.left} x2={PAD.left + plotW} y1={y(share)} y2={y(share)} stroke={colors.line} strokeWidth={1} />
              <SvgText x={PAD.left - 6} y={y(share) + 4} fontSize={11} fontFamily={fonts.mono} fill={colors.basaltMuted} textAnchor="end">
                {`${share * 100} %`}
              </SvgText>
            </G>
          ))}
          {phaseStarts
            .filter((t) => t > 0 && t <= steps)
            .map((t) => (
              <Line key={t} x1={x(t)} x2={x(t)} y1={PAD.top} y2={PAD.top + plotH} stroke={colors.basaltMuted} strokeWidth={1} strokeDasharray="2 4" />
            ))}
          {[0, Math.round(steps / 2), steps].map((t) => (
            <SvgText key={t} x={x(t)} y={HEIGHT - 10} fontSize={11} fontFamily={fonts.mono} fill={colors.basaltMuted} textAnchor="middle">
              {t === steps ? `step ${t}` : String(t)}
            </SvgText>
          ))}
          {states.map((state, j) => (
            <G key={state.code}>
              <Polyline
                points={path.map((shares, t) => `${x(t)},${y(shares[j])}`).join(' ')}
                fill="none"
                stroke={state.colour}
                strokeWidth={2.5}
                strokeDasharray={DASHES[j % DASHES.length] || undefined}
              />
              <Line
                x1={PAD.left + plotW + 4}
                x2={PAD.left + plotW + 20}
                y1={labelY[j]}
                y2={labelY[j]}
                stroke={state.colour}
                strokeWidth={2.5}
                strokeDasharray={DASHES[j % DASHES.length] || undefined}
              />
              <SvgText x={PAD.left + plotW + 24} y={labelY[j] + 4} fontSize={12} fontFamily={fonts.mono} fill={colors.basalt}>
                {`${state.code} ${percent(last[j])}`}
              </SvgText>
            </G>
          ))}
        </Svg>
      ) : null}
    </View>
  );
}
