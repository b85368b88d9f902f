import { useMemo, useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { G, Line, Path, Text as SvgText } from 'react-native-svg';

import { colors, fonts } from '@/components/theme';
import type { RunSummary } from '@/shared/schemas';

import { formatShare } from './formatShare';
import { chartScales, shareLines, type ChartBox } from './shareChart';

export type ShareChartProps = { summary: RunSummary };

const TICKS = [0, 0.25, 0.5, 0.75, 1];

/** The chart in the px of its width, so that text keeps its size from a phone to a wide screen. */
function boxFor(width: number): ChartBox {
  const narrow = width < 520;
  return { width, height: narrow ? 240 : 300, left: 40, right: narrow ? 150 : 190, top: 12, bottom: 30 };
}

/** Median area share of each state over the steps, in its colour, labelled at the line's end. */
export function ShareChart({ summary }: ShareChartProps): ReactElement {
  const [width, setWidth] = useState(720);
  const box = boxFor(width);
  const lines = useMemo(() => shareLines(summary.share.map((row) => row.map((q) => q.median)), boxFor(width)), [summary, width]);
  const { x, y } = chartScales(box, summary.steps);
  const end = x(summary.steps);
  return (
    <View role="img" aria-label="Median area share of each cover state over the steps" style={[styles.box, { aspectRatio: box.width / box.height }]} onLayout={(e) => setWidth(Math.max(300, Math.round(e.nativeEvent.layout.width)))}>
      <Svg width="100%" height="100%" viewBox={`0 0 ${box.width} ${box.height}`}>
        {TICKS.map((t) => (
          <G key={t}>
            <Line x1={box.left} x2={end} y1={y(t)} y2={y(t)} stroke={colors.line} strokeWidth={1} />
            <SvgText x={box.left - 6} y={y(t) + 4} fontSize={11} fontFamily={fonts.mono} fill={colors.basaltMuted} textAnchor="end">{`${t * 100}%`}</SvgText>
          </G>
        ))}
        <SvgText x={box.left} y={box.height - 8} fontSize={11} fontFamily={fonts.regular} fill={colors.basaltMuted}>
          step 0
        </SvgText>
        <SvgText x={end} y={box.height - 8} fontSize={11} fontFamily={fonts.regular} fill={colors.basaltMuted} textAnchor="end">{`step ${summary.steps}, year ${summary.steps * summary.yearsPerStep}`}</SvgText>
        {lines.map((line) => {
          const state = summary.states[line.state];
          return (
            <G key={state.code}>
              <Path d={line.path} stroke={state.colour} strokeWidth={2.5} fill="none" strokeLinejoin="round" />
              <Line x1={end} x2={end + 8} y1={line.endY} y2={line.labelY} stroke={state.colour} strokeWidth={1} />
              <SvgText x={end + 12} y={line.labelY + 4} fontSize={11} fontFamily={fonts.medium} fill={colors.basalt}>
                {`${state.name} ${formatShare(summary.share[summary.steps][line.state].median)}`}
              </SvgText>
            </G>
          );
        })}
      </Svg>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { width: '100%' },
});
