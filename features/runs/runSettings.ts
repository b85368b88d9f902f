import type { Run } from '@/shared/schemas';

/** "200 steps × 2 years · 20 replicates · seed 3f9c…" for lists and headings. */
export function runSettingsText(run: Run): string {
  return `${run.steps} steps × ${run.yearsPerStep} ${run.yearsPerStep === 1 ? 'year' : 'years'} · ${run.replicates} ${run.replicates === 1 ? 'replicate' : 'replicates'} · seed ${run.seed}`;
}
