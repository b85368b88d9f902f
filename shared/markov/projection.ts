import { vectorTimesMatrix, type TransitionMatrix } from './matrix';
import { phaseOfStep, type Phase } from './phases';

/** Expected path x_{t+1} = x_t P(t), t = 0…steps, P(t) the phase's matrix (row-vector form, brief §2). */
export function expectedPath(x0: readonly number[], phases: readonly Phase[], steps: number): number[][] {
  const phaseAt = phaseOfStep(phases, steps);
  const path = [[...x0]];
  for (let t = 0; t < steps; t++) path.push(vectorTimesMatrix(path[t], phases[phaseAt[t]].matrix.rows));
  return path;
}

export type Projection = { t: number; distribution: number[] };

/** x_t = x_0 P^t at the requested steps, by stepping the vector (K² work per step, no matrix powers). */
export function projectAt(x0: readonly number[], matrix: TransitionMatrix, steps: readonly number[]): Projection[] {
  const path = expectedPath(x0, [{ startStep: 0, matrix }], Math.max(0, ...steps));
  return steps.map((t) => ({ t, distribution: path[t] }));
}
