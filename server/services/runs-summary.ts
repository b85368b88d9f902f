// Per-step summary of a run over its replicates: mean, median, 5 % and 95 % of the area and the
// area share of each state, beside the expected path from the frozen inputs.
import { expectedPath, fsum, type RunResult, type RunSpec } from '../../shared/markov';
import { RUN_CAUTION, type QuantileSet, type RunSummary } from '../../shared/schemas';
import type { FrozenSpec } from './runs-inputs';

/** Quantile of sorted values with linear interpolation between order statistics (Hyndman & Fan 1996, type 7). */
export function quantile(sorted: readonly number[], p: number): number {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

function quantileSet(values: number[]): QuantileSet {
  const sorted = [...values].sort((a, b) => a - b);
  return { mean: fsum(values) / values.length, median: quantile(sorted, 0.5), p5: quantile(sorted, 0.05), p95: quantile(sorted, 0.95) };
}

/** Area-weighted share of each state at step 0 (x_0 of the expected path). */
export function startShares(spec: RunSpec, k: number): number[] {
  const area = new Array<number>(k).fill(0);
  const states = spec.initial.kind === 'states' ? spec.initial.states : new Uint8Array(0);
  states.forEach((s, i) => (area[s] += spec.areas ? spec.areas[i] : 1));
  const total = fsum(area);
  return area.map((a) => a / total);
}

export function summariseRun(runId: number, frozen: FrozenSpec, spec: RunSpec, yearsPerStep: number, result: RunResult): RunSummary {
  const k = frozen.states.length;
  const slots = result.steps + 1;
  const area: QuantileSet[][] = [];
  const share: QuantileSet[][] = [];
  for (let s = 0; s < slots; s++) {
    const byReplicate = Array.from({ length: result.replicates }, (_, r) => Array.from(result.areaTotals.subarray((r * slots + s) * k, (r * slots + s + 1) * k)));
    const totals = byReplicate.map((row) => fsum(row));
    area.push(Array.from({ length: k }, (_, j) => quantileSet(byReplicate.map((row) => row[j]))));
    share.push(Array.from({ length: k }, (_, j) => quantileSet(byReplicate.map((row, r) => row[j] / totals[r]))));
  }
  return {
    runId,
    states: frozen.states,
    steps: result.steps,
    yearsPerStep,
    replicates: result.replicates,
    totalAreaM2: frozen.totalAreaM2,
    area,
    share,
    expectedShare: expectedPath(startShares(spec, k), spec.phases, result.steps),
    method:
      'Over replicates at each step: mean; median, 5 % and 95 % quantiles by linear interpolation between order statistics (Hyndman & Fan 1996, type 7). ' +
      'Shares are area shares. The expected path is x_t = x_0 P(t) (row-vector form) from the area-weighted start cover.',
    caution: RUN_CAUTION,
  };
}
