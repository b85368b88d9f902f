import { analyzeChain, type ChainAnalysis } from '@/shared/markov/analysis';
import { createMatrix } from '@/shared/markov/matrix';
import { expectedPath } from '@/shared/markov/projection';
import type { ChainAnalysisJson, PhaseAnalysis, ScenarioAnalysis } from '@/shared/schemas';

/** What the panel draws, from the server (saved scenario) or the browser (unsaved edits). */
export type AnalysisView = Pick<ScenarioAnalysis, 'expectedPath' | 'phases' | 'yearsPerStep' | 'totalAreaM2'> & {
  source: 'server' | 'browser';
};

export type LivePhase = { fromStep: number; toStep: number | null; rows: number[][]; surveyId: number | null };

export type LiveInput = {
  /** State names, in the study area's order (the engine and the server name states this way). */
  names: string[];
  phases: LivePhase[];
  start: number[];
  yearsPerStep: number;
  totalAreaM2: number;
  steps: number;
};

/** Steps the expected path covers: 50, or longer so the last phase shows 30 steps. */
export function pathSteps(phaseStarts: readonly number[]): number {
  return Math.max(50, Math.max(...phaseStarts) + 30);
}

const finite = (value: number): number | null => (Number.isFinite(value) ? value : null);

/** The engine's analysis as the API sends it: "never" (Infinity) as null. */
export function chainToJson(chain: ChainAnalysis): ChainAnalysisJson {
  return {
    ...chain,
    dampingRatio: finite(chain.dampingRatio),
    residenceSteps: chain.residenceSteps.map(finite),
    meanRecurrence: chain.meanRecurrence.map(finite),
    meanFirstPassage: chain.meanFirstPassage?.map((row) => row.map(finite)) ?? null,
  };
}

/**
 * The same analysis as the server's, computed in the browser while the person types: each
 * phase's chain with mixing measured from the expected cover where the phase starts.
 */
export function liveAnalysis(input: LiveInput): AnalysisView {
  const matrices = input.phases.map((phase) => createMatrix(input.names, phase.rows));
  const path = expectedPath(
    input.start,
    matrices.map((matrix, n) => ({ startStep: input.phases[n].fromStep, matrix })),
    input.steps,
  );
  const phases = input.phases.map((phase, index): PhaseAnalysis => {
    const chain = chainToJson(analyzeChain(matrices[index], { initial: path[Math.min(phase.fromStep, input.steps)] }));
    return {
      index,
      fromStep: phase.fromStep,
      toStep: phase.toStep,
      surveyId: phase.surveyId,
      chain,
      longRunAreaM2: chain.stationary?.map((share) => share * input.totalAreaM2) ?? null,
      mixingYears: chain.mixingTime === null ? null : chain.mixingTime * input.yearsPerStep,
      residenceYears: chain.residenceSteps.map((steps) => (steps === null ? null : steps * input.yearsPerStep)),
      warnings: [],
    };
  });
  return { source: 'browser', expectedPath: path, phases, yearsPerStep: input.yearsPerStep, totalAreaM2: input.totalAreaM2 };
}
