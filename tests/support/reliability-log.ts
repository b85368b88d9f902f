// Figures that `npm run reliability` prints as one table. Tests record them as they run; under a
// plain `npm test` (no log file named) recording does nothing.
import { appendFileSync } from 'node:fs';

export type ReliabilityRow =
  | { kind: 'bad input'; name: string; tried: number; refusedCleanly: number; detail: string }
  | { kind: 'fault'; name: string; injected: number; survived: boolean; nothingLost: boolean; detail: string }
  | { kind: 'load'; name: string; requests: number; p50Ms: number; p99Ms: number; errors: number; detail: string };

export const RELIABILITY_LOG_ENV = 'PATCHCAST_RELIABILITY_LOG';

export function recordReliability(row: ReliabilityRow): void {
  const file = process.env[RELIABILITY_LOG_ENV];
  if (file) appendFileSync(file, `${JSON.stringify(row)}\n`);
}
