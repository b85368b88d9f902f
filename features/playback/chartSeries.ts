// What the area-share chart draws, per state and step, in the unit on screen.
import type { CoverState, RunSummary } from '@/shared/schemas';

import type { BandChartItem } from './BandChart';
import { binomialShareBand } from './binomialBand';

export type ChartMode = 'share' | 'area';

export type StateSeries = {
  p5: number[];
  p95: number[];
  median: number[];
  expected: number[];
  binomialLow: number[];
  binomialHigh: number[];
  /** Long-run share (or area) of the last phase; null without a unique stationary distribution. */
  longRun: number | null;
};

/**
 * Per state: the replicate band and median, the expected path, its binomial band and the long-run
 * level. `perUnit` is m² per display unit (ignored for shares). Areas of the expected path and
 * binomial band are shares × the total area.
 */
export function chartSeries(summary: RunSummary, mode: ChartMode, perUnit: number, patchCount: number, longRun: readonly number[] | null): StateSeries[] {
  const total = summary.totalAreaM2;
  const fromShare = (share: number): number => (mode === 'share' ? share : (share * total) / perUnit);
  const pick = mode === 'share' ? summary.share : summary.area;
  const fromQuantile = (v: number): number => (mode === 'share' ? v : v / perUnit);
  return summary.states.map((_, j) => {
    const bands = summary.expectedShare.map((x) => binomialShareBand(x[j], patchCount));
    return {
      p5: pick.map((row) => fromQuantile(row[j].p5)),
      p95: pick.map((row) => fromQuantile(row[j].p95)),
      median: pick.map((row) => fromQuantile(row[j].median)),
      expected: summary.expectedShare.map((x) => fromShare(x[j])),
      binomialLow: bands.map((band) => fromShare(band.low)),
      binomialHigh: bands.map((band) => fromShare(band.high)),
      longRun: longRun ? fromShare(longRun[j]) : null,
    };
  });
}

/** The chart's items: one per state, coloured and labelled by its code. */
export function stateItems(states: readonly CoverState[], series: readonly StateSeries[]): BandChartItem[] {
  return series.map((s, j) => ({
    key: states[j]?.code ?? String(j),
    label: states[j]?.code ?? '',
    colour: states[j]?.colour ?? '#999999',
    dash: '',
    low: s.p5,
    high: s.p95,
    middle: s.median,
    expected: s.expected,
    reference: { low: s.binomialLow, high: s.binomialHigh },
    level: s.longRun,
  }));
}
