// Writes cinder-flat-plots.csv: 60 invented plots visited yearly 2013–2024, their cover drawn
// from an invented "true" annual matrix with a seeded stream, so the file is reproducible.
// Run: npx tsx server/seed/surveys/generate-cinder-flat-plots.ts
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { createStream, inverseCdfSampler, type Xoshiro128 } from '../../../shared/markov';

/** The labels the (invented) field crew used, in the study area's state order. */
const LABELS = ['shrub', 'perennial grass', 'annual grass', 'bare'];
/** Invented annual transitions under current grazing (rows: from; columns: to). */
export const TRUE_MATRIX = [
  [0.9, 0.05, 0.04, 0.01],
  [0.03, 0.85, 0.09, 0.03],
  [0.01, 0.06, 0.83, 0.1],
  [0, 0.04, 0.26, 0.7],
];
const START = [0.45, 0.25, 0.22, 0.08];
const PLOTS = 60;
const YEARS = Array.from({ length: 12 }, (_, i) => 2013 + i);
const OBSERVERS = ['RD', 'TW', 'AO'];

function draw(weights: readonly number[], stream: Xoshiro128): number {
  return inverseCdfSampler(weights)(stream.nextFloat());
}

export function cinderFlatPlotsCsv(): string {
  const stream = createStream('cinder-flat-demo-survey', 'plots');
  const lines = ['plot_id,year,cover_class,observer'];
  for (let p = 1; p <= PLOTS; p++) {
    let state = draw(START, stream);
    for (const year of YEARS) {
      // About one visit in 25 was missed: the state still changes, but nothing is recorded.
      const missed = year !== YEARS[0] && stream.nextFloat() < 0.04;
      if (!missed) lines.push(`CF-${String(p).padStart(2, '0')},${year},${LABELS[state]},${OBSERVERS[(p + year) % 3]}`);
      state = draw(TRUE_MATRIX[state], stream);
    }
  }
  return `${lines.join('\n')}\n`;
}

if (require.main === module) writeFileSync(path.join(__dirname, 'cinder-flat-plots.csv'), cinderFlatPlotsCsv());
