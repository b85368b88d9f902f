// The comparison table at one step: per state and run, the median area and share, the
// difference to the first run, and whether the 5–95 % replicate bands of the share overlap.
import type { CoverState, RunSummary } from '@/shared/schemas';
import { bandsOverlap } from '@/features/playback/binomialBand';

export type CompareCell = {
  runId: number;
  areaM2: number;
  share: number;
  /** Versus the first run; null for the first run itself. */
  areaDifferenceM2: number | null;
  shareDifference: number | null;
  /** The share's 5–95 % band meets the first run's; null for the first run itself. */
  bandsOverlap: boolean | null;
};

export type CompareRow = { state: CoverState; cells: (CompareCell | null)[] };

/** Rows by the first run's states; a run without a state of that code (states edited between runs) gets null. */
export function compareTable(summaries: readonly RunSummary[], step: number): CompareRow[] {
  const [first] = summaries;
  if (!first) return [];
  return first.states.map((state, j) => {
    const reference = first.share[step]?.[j];
    const referenceArea = first.area[step]?.[j];
    return {
      state,
      cells: summaries.map((summary, r) => {
        const k = summary.states.findIndex((other) => other.code === state.code);
        const share = summary.share[step]?.[k];
        const area = summary.area[step]?.[k];
        if (k < 0 || !share || !area) return null;
        const isFirst = r === 0 || !reference || !referenceArea;
        return {
          runId: summary.runId,
          areaM2: area.median,
          share: share.median,
          areaDifferenceM2: isFirst ? null : area.median - referenceArea.median,
          shareDifference: isFirst ? null : share.median - reference.median,
          bandsOverlap: isFirst ? null : bandsOverlap({ low: share.p5, high: share.p95 }, { low: reference.p5, high: reference.p95 }),
        };
      }),
    };
  });
}
