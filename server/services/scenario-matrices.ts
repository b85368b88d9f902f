// A scenario's matrices against its study area's states: every problem found at once, in the
// engine's words, and the engine's phase list for analysis.
import { AppError } from '../http/errors';
import { createMatrix, MarkovInputError, validatePhases, type Phase } from '../../shared/markov';

type PhaseMatrix = { fromStep: number; matrix: number[][] };
type Problem = { path: string; message: string };

const unitRow = (i: number, k: number): number[] => Array.from({ length: k }, (_, j) => (i === j ? 1 : 0));

/** The engine's complaint about row i of a matrix whose other rows are unit rows, or null. */
function probe(states: readonly string[], i: number, row: readonly number[]): string | null {
  try {
    createMatrix(states, states.map((_, r) => (r === i ? row : unitRow(r, states.length))));
    return null;
  } catch (err) {
    if (err instanceof MarkovInputError) return err.message;
    throw err;
  }
}

/**
 * Problems of one row in the engine's words: each cell alone (the cell with zeros beside it, so
 * only its own range is judged), then, when every cell is fine, the row as a whole (its sum).
 */
function rowProblems(states: readonly string[], row: readonly number[], i: number): string[] {
  const whole = (): string[] => {
    const message = probe(states, i, row);
    return message === null ? [] : [message];
  };
  if (row.length !== states.length) return whole();
  const cells = row.flatMap((v, j) => {
    const message = probe(states, i, row.map((_, c) => (c === j ? v : 0)));
    return message !== null && message.startsWith('cell ') ? [message] : [];
  });
  return cells.length > 0 ? cells : whole();
}

/** Problems of one matrix: every bad cell, else every row whose sum is off; one bad row never hides another. */
function matrixProblems(states: readonly string[], rows: readonly number[][], path: string): Problem[] {
  const k = states.length;
  if (rows.length !== k) return [{ path, message: `${rows.length} rows given for ${k} states (${states.join(', ')}); give one row per state` }];
  return rows.flatMap((row, i) => rowProblems(states, row, i).map((message) => ({ path: `${path}.${i}`, message })));
}

/** Refuses (400) a scenario whose matrices do not fit the states, naming every bad row and cell by phase. */
export function checkMatrices(states: readonly string[], phases: readonly PhaseMatrix[]): void {
  const problems = phases.flatMap((p, n) => matrixProblems(states, p.matrix, `phases.${n}.matrix`).map((q) => ({ ...q, message: `phase ${n + 1}: ${q.message}` })));
  if (problems.length === 0) return;
  throw new AppError(400, 'invalid_matrix', `The scenario was not saved: ${problems.map((q) => q.message).join('; ')}.`, { issues: problems });
}

/** The engine's phases (validated) for saved, checked matrices. */
export function enginePhases(states: readonly string[], phases: readonly PhaseMatrix[]): Phase[] {
  const out = phases.map((p) => ({ startStep: p.fromStep, matrix: createMatrix(states, p.matrix) }));
  validatePhases(out);
  return out;
}
