import { MarkovInputError } from './errors';
import type { TransitionMatrix } from './matrix';

/**
 * A stretch of steps with its own matrix: the transition from step t to t + 1 uses the phase with
 * the largest startStep ≤ t. The first phase starts at step 0; one phase is a stationary chain.
 */
export type Phase = { startStep: number; matrix: TransitionMatrix };

/** Checks that phases start at 0, increase strictly and share one state list. */
export function validatePhases(phases: readonly Phase[]): void {
  if (phases.length === 0) throw new MarkovInputError('no phases given; a scenario needs at least one matrix');
  if (phases[0].startStep !== 0) throw new MarkovInputError(`the first phase starts at step ${phases[0].startStep}; it must start at 0`);
  const states = phases[0].matrix.states.join('\u0000');
  phases.forEach((phase, n) => {
    if (n > 0 && !(Number.isInteger(phase.startStep) && phase.startStep > phases[n - 1].startStep)) {
      throw new MarkovInputError(`phase ${n + 1} starts at step ${phase.startStep}; phase starts must be whole numbers that increase`);
    }
    if (phase.matrix.states.join('\u0000') !== states) {
      throw new MarkovInputError(`phase ${n + 1} has different states from phase 1; all phases use the same states in the same order`);
    }
  });
}

/** phaseOfStep[t] = index of the phase used for the transition t → t + 1, for t < steps. */
export function phaseOfStep(phases: readonly Phase[], steps: number): Uint8Array {
  const out = new Uint8Array(steps);
  let n = 0;
  for (let t = 0; t < steps; t++) {
    while (n + 1 < phases.length && phases[n + 1].startStep <= t) n++;
    out[t] = n;
  }
  return out;
}
