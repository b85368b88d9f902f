import { scaleLinear } from 'd3-scale';
import { area as d3Area, line as d3Line } from 'd3-shape';
import { useState, type ReactElement } from 'react';
import { View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Path, Text as SvgText } from 'react-native-svg';

import { colors, fonts } from '@/components/theme';
import { spreadLabels } from '@/features/scenarios/analysis/spreadLabels';

/** One labelled series over steps 0…T: a band, a middle line, and optional reference traces. */
export type BandChartItem = {
  key: string;
  /** Direct label at the right end (the value at the last step follows it). */
  label: string;
  colour: string;
  /** Dash pattern of the middle line ('' = solid), so items differ without colour. */
  dash: string;
  low: readonly number[];
  high: readonly number[];
  middle: readonly number[];
  /** Drawn dashed in basalt. */
  expected?: readonly number[];
  /** Edges drawn as thin dashes. */
  reference?: { low: readonly number[]; high: readonly number[] };
  /** A flat level, dotted. */
  level?: number | null;
};

export type BandChartProps = {
  items: readonly BandChartItem[];
  /** Step marked by the cursor. */
  cursor: number;
  formatValue: (value: number) => string;
  label: string;
  height?: number;
};

const PAD = { top: 10, right: 100, bottom: 28, left: 52 };
export const DASH = { expected: '6 4', level: '1.5 3', reference: '3 2' } as const;

function ceiling(items: readonly BandChartItem[]): number {
  let top = 0;
  for (const item of items) top = Math.max(top, ...item.high, ...(item.reference?.high ?? []), ...(item.expected ?? []), item.level ?? 0);
  return top > 0 ? top * 1.05 : 1;
}

/** Bands (filled), middle lines, reference traces and direct labels over steps, with a step cursor. */
export function BandChart({ items, cursor, formatValue, label, height = 260 }: BandChartProps): ReactElement {
  const [width, setWidth] = useState(0);
  const onLayout = (event: LayoutChangeEvent): void => setWidth(Math.round(event.nativeEvent.layout.width));
  const steps = Math.max(1, ...items.map((item) => item.middle.length - 1));
  const x = scaleLinear().domain([0, steps]).range([PAD.left, Math.max(PAD.left + 1, width - PAD.right)]);
  const y = scaleLinear().domain([0, ceiling(items)]).range([height - PAD.bottom, PAD.top]).nice();
  const band = (low: readonly number[], high: readonly number[]): string =>
    d3Area<number>().x((t) => x(t)).y0((t) => y(low[t])).y1((t) => y(high[t]))(low.map((_, t) => t)) ?? '';
  const trace = (values: readonly number[]): string => d3Line<number>().x((t) => x(t)).y((t) => y(values[t]))(values.map((_, t) => t)) ?? '';
  const lastOf = (values: readonly number[]): number => values[values.length - 1] ?? 0;
  const labelY = spreadLabels(items.map((item) => y(lastOf(item.middle))), 13, PAD.top + 4, height - PAD.bottom);
  return (
    <View onLayout={onLayout} role="img" aria-label={label}>
      {width > 0 ? (
        <Svg width={width} height={height}>
          {y.ticks(4).map((tick) => (
            <G key={tick}>
              <Line x1={PAD.left} x2={x(steps)} y1={y(tick)} y2={y(tick)} stroke={colors.line} strokeWidth={1} />
              <SvgText x={PAD.left - 6} y={y(tick) + 4} fontSize={11} fontFamily={fonts.mono} fill={colors.basaltMuted} textAnchor="end">
                {formatValue(tick)}
              </SvgText>
            </G>
          ))}
          {x.ticks(6).map((tick) => (
            <SvgText key={tick} x={x(tick)} y={height - 10} fontSize={11} fontFamily={fonts.mono} fill={colors.basaltMuted} textAnchor="middle">
              {String(tick)}
            </SvgText>
          ))}
          {items.map((item, i) => (
            <G key={item.key}>
              <Path d={band(item.low, item.high)} fill={item.colour} fillOpacity={0.22} />
              {item.reference ? (
                <>
                  <Path d={trace(item.reference.low)} fill="none" stroke={item.colour} strokeWidth={0.8} strokeDasharray={DASH.reference} />
                  <Path d={trace(item.reference.high)} fill="none" stroke={item.colour} strokeWidth={0.8} strokeDasharray={DASH.reference} />
                </>
              ) : null}
              {item.expected ? <Path d={trace(item.expected)} fill="none" stroke={colors.basalt} strokeWidth={1.2} strokeDasharray={DASH.expected} /> : null}
              <Path d={trace(item.middle)} fill="none" stroke={item.colour} strokeWidth={2} strokeDasharray={item.dash || undefined} />
              {item.level !== undefined && item.level !== null ? (
                <Line x1={PAD.left} x2={x(steps)} y1={y(item.level)} y2={y(item.level)} stroke={item.colour} strokeWidth={1.5} strokeDasharray={DASH.level} />
              ) : null}
              <SvgText x={x(steps) + 6} y={labelY[i] + 4} fontSize={11} fontFamily={fonts.medium} fill={colors.basalt}>
                {`${item.label} ${formatValue(lastOf(item.middle))}`}
              </SvgText>
            </G>
          ))}
          <Line x1={x(cursor)} x2={x(cursor)} y1={PAD.top} y2={height - PAD.bottom} stroke={colors.basalt} strokeWidth={1.5} />
        </Svg>
      ) : null}
    </View>
  );
}
