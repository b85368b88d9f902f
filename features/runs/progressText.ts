import type { Run, RunStatus } from '@/shared/schemas';

export const STATUS_LABEL: Record<RunStatus, string> = {
  queued: 'Queued',
  running: 'Running',
  merging: 'Merging results',
  succeeded: 'Finished',
  failed: 'Failed',
  cancelled: 'Cancelled',
};

/** "about 40 s", "about 3 min", "about 1 h 20 min" (rounded up to the unit shown). */
export function formatTimeLeft(seconds: number): string {
  if (seconds < 60) return `about ${Math.max(1, Math.ceil(seconds))} s`;
  const minutes = Math.ceil(seconds / 60);
  if (minutes < 60) return `about ${minutes} min`;
  return `about ${Math.floor(minutes / 60)} h ${minutes % 60} min`;
}

/** "42 % · about 3 min left", or the status when the run has ended. */
export function progressText(run: Run): string {
  const { percent, secondsLeft } = run.progress;
  if (run.status === 'succeeded' || run.status === 'failed' || run.status === 'cancelled') return STATUS_LABEL[run.status];
  const left = secondsLeft === null ? 'estimating time left' : `${formatTimeLeft(secondsLeft)} left`;
  return `${STATUS_LABEL[run.status]} · ${percent.toFixed(0)} % · ${left}`;
}
