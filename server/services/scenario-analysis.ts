// The analysis panel: for each phase of a scenario, the engine's analysis of its stationary chain,
// with areas, years and plain-language readings, and the expected path across all phases.
import { analyzeChain, expectedPath, type ChainAnalysis } from '../../shared/markov';
import type { ChainAnalysisJson, ScenarioAnalysis } from '../../shared/schemas';
import { startCoverSummary } from './start-cover';
import { chainReadings } from './chain-readings';
import { enginePhases } from './scenario-matrices';
import { fitsStudyArea, stateNames, statesChanged, type ScenarioAccess } from './scenarios';

/** The standing caution of brief §8. */
export const CAUTION =
  'Forecasts are model output under a stationary Markov assumption estimated from limited data; they are not predictions of what will happen on the ground. ' +
  "Check them against field monitoring, state the data and matrix behind every chart, and follow the land-management agency's guidance and local regulations before acting on them.";

const finite = (x: number): number | null => (Number.isFinite(x) ? x : null);

/** The engine's analysis as JSON: Infinity ("never") becomes null. */
function toJson(chain: ChainAnalysis): ChainAnalysisJson {
  return {
    ...chain,
    dampingRatio: finite(chain.dampingRatio),
    residenceSteps: chain.residenceSteps.map(finite),
    meanRecurrence: chain.meanRecurrence.map(finite),
    meanFirstPassage: chain.meanFirstPassage && chain.meanFirstPassage.map((row) => row.map(finite)),
  };
}

type StartShares = ScenarioAnalysis['start'];

/** Step-0 shares: the scenario's own proportions, else the study area's start cover by area, else uniform. */
async function startShares(access: ScenarioAccess, k: number): Promise<StartShares> {
  const cover = access.scenario.startCover;
  if (cover.source === 'proportions') return { source: 'proportions', shares: cover.proportions };
  const summary = await startCoverSummary(access.area);
  if (!summary) return { source: 'none', shares: new Array<number>(k).fill(1 / k) };
  const total = summary.areaM2.reduce((a, b) => a + b, 0);
  return { source: 'study-area', shares: summary.areaM2.map((a) => a / total) };
}

export async function scenarioAnalysis(access: ScenarioAccess, steps: number): Promise<ScenarioAnalysis> {
  const { scenario, area } = access;
  if (!fitsStudyArea(scenario, area)) throw statesChanged();
  const names = stateNames(area);
  const rows = scenario.phases ?? [];
  const phases = enginePhases(names, rows);
  const start = await startShares(access, names.length);
  const path = expectedPath(start.shares, phases, Math.max(steps, ...rows.map((p) => p.fromStep)));
  const { totalAreaM2 } = area.studyArea;
  const years = (x: number | null): number | null => (x === null ? null : x * scenario.yearsPerStep);
  return {
    scenarioId: scenario.id,
    states: (area.studyArea.states ?? []).map((s) => ({ code: s.code, name: s.name, colour: s.colour })),
    totalAreaM2,
    yearsPerStep: scenario.yearsPerStep,
    start,
    expectedPath: path.slice(0, steps + 1),
    phases: phases.map((phase, index) => {
      // Mixing and projections start from the expected cover when the phase begins.
      const raw = analyzeChain(phase.matrix, { initial: path[phase.startStep] });
      const chain = toJson(raw);
      return {
        index,
        fromStep: rows[index].fromStep,
        toStep: rows[index].toStep,
        surveyId: rows[index].surveyId,
        chain,
        longRunAreaM2: chain.stationary && chain.stationary.map((share) => share * totalAreaM2),
        mixingYears: years(chain.mixingTime),
        residenceYears: chain.residenceSteps.map(years),
        warnings: chainReadings(raw, scenario.yearsPerStep),
      };
    }),
    caution: CAUTION,
  };
}
