// Scenarios through the API: roles on every route, refusals that name every bad row and phase,
// the analysis of textbook chains, phases, uncertainty, and the demo scenarios.
import { EVERYONE, startFixture, type Fixture, type Who } from '../support/study-area-fixture';
import { Scenario, ScenarioPhaseRow } from '../../server/models';
import { seedDemo } from '../../server/seed/demo';
import { seedDemoScenarios } from '../../server/seed/demo-scenarios';
import { vectorTimesMatrix } from '../../shared/markov';
import type { PhaseAnalysis, ScenarioBody } from '../../shared/schemas';

let f: Fixture;
let fourStates: number;
let oz: number;

const FOUR = ['Shrub steppe', 'Perennial grassland', 'Annual grassland', 'Bare soil'];
const GRAZING = [
  [0.9, 0.05, 0.04, 0.01],
  [0.03, 0.85, 0.09, 0.03],
  [0.01, 0.06, 0.83, 0.1],
  [0, 0.04, 0.26, 0.7],
];
// Grinstead & Snell, Introduction to Probability, ch. 11, the Land of Oz (states Rain, Nice, Snow).
const OZ = [
  [0.5, 0.25, 0.25],
  [0.5, 0, 0.5],
  [0.25, 0.25, 0.5],
];

const body = (matrix: number[][], extra: Partial<ScenarioBody> = {}): ScenarioBody => ({ name: 'Scenario', notes: '', phases: [{ fromStep: 0, toStep: null, matrix, surveyId: null }], ...extra });
const url = (path: string): string => `/api/v1${path}`;

async function create(areaId: number, b: ScenarioBody): Promise<number> {
  const res = await f.as.editor.post(url(`/study-areas/${areaId}/scenarios`), b);
  if (res.status !== 201) throw new Error(JSON.stringify(res.body));
  return res.body.scenario.id;
}

beforeAll(async () => {
  f = await startFixture();
  fourStates = await f.makeArea(FOUR);
  oz = await f.makeArea(['Rain', 'Nice', 'Snow']);
});
afterAll(() => f.t.close());

describe('roles', () => {
  const expected: Record<string, Record<Who, number>> = {
    read: { owner: 200, editor: 200, viewer: 200, outsider: 404, anonymous: 401 },
    create: { owner: 201, editor: 201, viewer: 403, outsider: 404, anonymous: 401 },
    change: { owner: 200, editor: 200, viewer: 403, outsider: 404, anonymous: 401 },
    remove: { owner: 204, editor: 204, viewer: 403, outsider: 404, anonymous: 401 },
  };

  test.each(EVERYONE)('when %s calls every scenario route, then the answer follows the role', async (who) => {
    const id = await create(fourStates, body(GRAZING, { name: `For ${who}` }));
    const c = f.as[who];
    const got = {
      list: (await c.get(url(`/study-areas/${fourStates}/scenarios`))).status,
      detail: (await c.get(url(`/scenarios/${id}`))).status,
      analysis: (await c.get(url(`/scenarios/${id}/analysis`))).status,
      uncertainty: (await c.get(url(`/scenarios/${id}/uncertainty?draws=100`))).status,
      create: (await c.post(url(`/study-areas/${fourStates}/scenarios`), body(GRAZING))).status,
      replace: (await c.put(url(`/scenarios/${id}`), body(GRAZING, { name: 'Renamed' }))).status,
      duplicate: (await c.post(url(`/scenarios/${id}/duplicate`), {})).status,
      useSurvey: (await c.post(url(`/scenarios/${id}/phases/0/use-survey`), { surveyId: 999999 })).status,
      remove: (await c.delete(url(`/scenarios/${id}`))).status,
    };
    expect(got).toEqual({
      list: expected.read[who],
      detail: expected.read[who],
      analysis: expected.read[who],
      uncertainty: expected.read[who],
      create: expected.create[who],
      replace: expected.change[who],
      duplicate: expected.create[who],
      // An editor gets past the role check to the survey check (no such survey in this study area).
      useSurvey: { ...expected.change, owner: 400, editor: 400 }[who],
      remove: expected.remove[who],
    });
  });
});

describe('refusals', () => {
  test.each([
    ['a row too short', [[0.5, 0.5, 0], GRAZING[1], GRAZING[2], GRAZING[3]], [/row 'Shrub steppe' has 3 entries; it needs 4/]],
    ['three rows for four states', GRAZING.slice(0, 3), [/3 rows given for 4 states/]],
    ['an entry above 1 and a negative one', [[1.1, -0.1, 0, 0], GRAZING[1], GRAZING[2], GRAZING[3]], [/cell from 'Shrub steppe' to 'Shrub steppe': 1\.1 is greater than 1/, /cell from 'Shrub steppe' to 'Perennial grassland': -0\.1 is negative/]],
    ['two rows that do not sum to 1', [GRAZING[0], [0.5, 0.5, 0.5, 0], GRAZING[2], [0, 0.04, 0.26, 0.67]], [/row 'Perennial grassland' sums to 1\.5/, /row 'Bare soil' sums to 0\.97/]],
  ])('when a matrix has %s, then 400 names each bad row and cell, and nothing is saved', async (_what, matrix, messages) => {
    const before = await Scenario.count();
    const res = await f.as.editor.post(url(`/study-areas/${fourStates}/scenarios`), body(matrix));
    expect(res.status).toBe(400);
    for (const m of messages) expect(res.body.error.message).toMatch(m);
    expect(res.body.error.message).toMatch(/^The scenario was not saved: phase 1: /);
    expect(res.body.error.details.issues.length).toBe(messages.length);
    expect(await Scenario.count()).toBe(before);
  });

  const phase = (fromStep: number, toStep: number | null) => ({ fromStep, toStep, matrix: GRAZING, surveyId: null });
  test.each([
    ['a gap between phases', [phase(0, 3), phase(4, null)], /phase 2 starts at step 4 but phase 1 ends at step 3/],
    ['a first phase that starts late', [phase(1, null)], /the first phase must start at step 0/],
    ['an open-ended phase before the last', [phase(0, null), phase(3, null)], /only the last phase may run to the end/],
    ['a phase that ends before it starts', [phase(0, 2), phase(2, 2)], /phase 2 ends at step 2; it must end after its start/],
    ['six phases', [0, 1, 2, 3, 4, 5].map((n) => phase(n, n === 5 ? null : n + 1)), /at most 5 phases/],
    ['no phases', [], /at least one phase/],
  ])('when the phases have %s, then 400 says so and nothing is saved', async (_what, phases, message) => {
    const before = await ScenarioPhaseRow.count();
    const res = await f.as.editor.post(url(`/study-areas/${fourStates}/scenarios`), { name: 'Bad phases', phases });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(message);
    expect(await ScenarioPhaseRow.count()).toBe(before);
  });

  test('when a replacement is bad, then the saved scenario is unchanged', async () => {
    const id = await create(fourStates, body(GRAZING, { name: 'Kept' }));
    const before = (await f.as.viewer.get(url(`/scenarios/${id}`))).body.scenario;
    const res = await f.as.editor.put(url(`/scenarios/${id}`), body([[1, 0, 0, 0], [1, 0, 0, 0], [1, 0, 0, 0], [0.5, 0, 0, 0]], { name: 'Changed' }));
    expect(res.status).toBe(400);
    expect((await f.as.viewer.get(url(`/scenarios/${id}`))).body.scenario).toEqual(before);
  });

  test('when start-cover proportions do not fit the states, or the body is not JSON-shaped, then 400 says what to fix', async () => {
    const wrongCount = await f.as.editor.post(url(`/study-areas/${fourStates}/scenarios`), body(GRAZING, { startCover: { source: 'proportions', method: 'random', proportions: [0.5, 0.5] } }));
    expect(wrongCount.status).toBe(400);
    expect(wrongCount.body.error.message).toMatch(/2 shares for 4 states/);
    const notNumbers = await f.as.editor.post(url(`/study-areas/${fourStates}/scenarios`), { name: 'X', phases: [{ fromStep: 0, toStep: null, matrix: [['a']] }] });
    expect(notNumbers.status).toBe(400);
    expect(notNumbers.body.error.message).toMatch(/phases\.0\.matrix\.0\.0: each matrix entry must be a number/);
  });
});

describe('analysis', () => {
  test('when the Land of Oz chain is analysed, then the API gives the textbook long-run shares, return times and first passages', async () => {
    const id = await create(oz, body(OZ, { startCover: { source: 'proportions', method: 'exact', proportions: [1, 0, 0] } }));
    const res = await f.as.viewer.get(url(`/scenarios/${id}/analysis?steps=6`));
    expect(res.status).toBe(200);
    const a = res.body;
    const [p] = a.phases as PhaseAnalysis[];
    // π = (0.4, 0.2, 0.4) (Grinstead & Snell ch. 11, Land of Oz).
    p.chain.stationary!.forEach((v, i) => expect(v).toBeCloseTo([0.4, 0.2, 0.4][i], 12));
    // Mean recurrence 1/π_i.
    p.chain.meanRecurrence.forEach((v, i) => expect(v).toBeCloseTo([2.5, 5, 2.5][i], 10));
    // Mean first passage matrix of the Land of Oz (as in Grinstead & Snell ch. 11; checked by hand by
    // solving m_ij = 1 + Σ_{k≠j} p_ik m_kj: m_RN = 4, m_NR = 8/3, m_SR = 10/3).
    const M = [
      [0, 4, 10 / 3],
      [8 / 3, 0, 8 / 3],
      [10 / 3, 4, 0],
    ];
    p.chain.meanFirstPassage!.forEach((row, i) => row.forEach((v, j) => expect(v).toBeCloseTo(M[i][j], 10)));
    // Eigenvalues 1, ¼, −¼ (trace 1, determinant −1/16): |λ₂| = ¼.
    expect(p.chain.lambda2Modulus).toBeCloseTo(0.25, 10);
    expect(p.chain.dampingRatio).toBeCloseTo(4, 8);
    // Starting in Rain, two days on: row Rain of P² = (0.4375, 0.1875, 0.375).
    expect(a.expectedPath).toHaveLength(7);
    a.expectedPath[2].forEach((v: number, i: number) => expect(v).toBeCloseTo([0.4375, 0.1875, 0.375][i], 12));
    p.longRunAreaM2!.forEach((v, i) => expect(v).toBeCloseTo(p.chain.stationary![i] * a.totalAreaM2, 3));
    // Residence 1/(1 − p_ii): 2, 1, 2 steps.
    expect(p.chain.residenceSteps).toEqual([2, 1, 2]);
    expect(p.warnings).toEqual([]);
    expect(p.mixingYears).toBe(p.chain.mixingTime);
    expect(a.caution).toMatch(/not predictions/);
  });

  test('when the chain is a drunkard\'s walk with two absorbing ends, then the absorption times and probabilities are the textbook ones and the warnings say so', async () => {
    const walk = await f.makeArea(['Edge A', 'One', 'Two', 'Three', 'Edge B']);
    const P = [
      [1, 0, 0, 0, 0],
      [0.5, 0, 0.5, 0, 0],
      [0, 0.5, 0, 0.5, 0],
      [0, 0, 0.5, 0, 0.5],
      [0, 0, 0, 0, 1],
    ];
    const id = await create(walk, body(P, { yearsPerStep: 2 }));
    const [p] = (await f.as.viewer.get(url(`/scenarios/${id}/analysis`))).body.phases as PhaseAnalysis[];
    // Grinstead & Snell ch. 11.2, the drunkard's walk on 0…4: t = N·1 = (3, 4, 3), B = N·R.
    expect(p.chain.absorption!.expectedSteps.map((v) => Number(v.toFixed(10)))).toEqual([0, 3, 4, 3, 0]);
    expect(p.chain.absorption!.probabilities[1].map((v) => Number(v.toFixed(10)))).toEqual([0.75, 0, 0, 0, 0.25]);
    expect(p.chain.stationary).toBeNull();
    expect(p.longRunAreaM2).toBeNull();
    expect(p.chain.residenceSteps[0]).toBeNull();
    expect(p.residenceYears[1]).toBe(2);
    expect(p.warnings.join(' ')).toMatch(/reducible: it has 2 closed groups/);
    expect(p.warnings.join(' ')).toMatch(/'One', 'Two', 'Three' are transient/);
    expect(p.warnings.join(' ')).toMatch(/'Edge A', 'Edge B' are absorbing states/);
    expect(p.warnings.join(' ')).toMatch(/from 'Two' 4 steps \(8 years\)/);
  });

  test('when a chain cycles, then the warning explains the period', async () => {
    const id = await create(oz, body([[0, 1, 0], [0, 0, 1], [1, 0, 0]], { startCover: { source: 'proportions', method: 'exact', proportions: [1, 0, 0] } }));
    const [p] = (await f.as.viewer.get(url(`/scenarios/${id}/analysis`))).body.phases as PhaseAnalysis[];
    expect(p.chain.period).toEqual([{ class: ['Rain', 'Nice', 'Snow'], period: 3 }]);
    expect(p.chain.mixingTime).toBeNull();
    expect(p.warnings[0]).toMatch(/cycle of period 3.*long-run shares are averages over a cycle/);
  });

  test('when a scenario has two phases, then the expected path switches matrix at the phase boundary', async () => {
    const id = await create(oz, {
      name: 'Two phases',
      startCover: { source: 'proportions', method: 'random', proportions: [0, 1, 0] },
      phases: [
        { fromStep: 0, toStep: 2, matrix: OZ, surveyId: null },
        { fromStep: 2, toStep: null, matrix: [[1, 0, 0], [1, 0, 0], [0, 0, 1]], surveyId: null },
      ],
    });
    const a = (await f.as.viewer.get(url(`/scenarios/${id}/analysis?steps=4`))).body;
    const x2 = vectorTimesMatrix(vectorTimesMatrix([0, 1, 0], OZ), OZ);
    const x3 = vectorTimesMatrix(x2, [[1, 0, 0], [1, 0, 0], [0, 0, 1]]);
    a.expectedPath[2].forEach((v: number, i: number) => expect(v).toBeCloseTo(x2[i], 12));
    a.expectedPath[3].forEach((v: number, i: number) => expect(v).toBeCloseTo(x3[i], 12));
    expect(a.phases.map((p: PhaseAnalysis) => [p.fromStep, p.toStep])).toEqual([[0, 2], [2, null]]);
  });

  test('when the study area has no start cover and the scenario uses it, then uniform shares are used and said so', async () => {
    const id = await create(oz, body(OZ));
    const a = (await f.as.viewer.get(url(`/scenarios/${id}/analysis`))).body;
    expect(a.start).toEqual({ source: 'none', shares: [1 / 3, 1 / 3, 1 / 3] });
  });

  test('when the study area\'s states change, then the scenario says it no longer fits and analysis answers 409', async () => {
    const area = await f.makeArea(['A', 'B']);
    const id = await create(area, body([[0.5, 0.5], [0.5, 0.5]]));
    await f.as.editor.put(url(`/study-areas/${area}/states`), { states: ['A', 'B', 'C'].map((n, i) => ({ code: `X${i}`, name: n, colour: '#000000' })) });
    expect((await f.as.viewer.get(url(`/scenarios/${id}`))).body.scenario.fitsStudyArea).toBe(false);
    const res = await f.as.viewer.get(url(`/scenarios/${id}/analysis`));
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/cover states changed/);
  });

  test('when the analysis query is out of range, then 400 names it', async () => {
    const id = await create(oz, body(OZ));
    const res = await f.as.viewer.get(url(`/scenarios/${id}/analysis?steps=5000`));
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/steps must be at most 1,000/);
  });
});

describe('keeping scenarios', () => {
  test('when a scenario is duplicated, then the copy has its phases, a new name and the copier as author; the original is untouched', async () => {
    const id = await create(oz, { ...body(OZ), name: 'Original', notes: 'some notes', yearsPerStep: 5 });
    const copy = (await f.as.owner.post(url(`/scenarios/${id}/duplicate`), {})).body.scenario;
    expect(copy.name).toBe('Original (copy)');
    expect(copy.phases.map((p: { matrix: number[][] }) => p.matrix)).toEqual([OZ]);
    expect(copy.yearsPerStep).toBe(5);
    expect(copy.createdBy).toBe('Owner');
    const named = (await f.as.editor.post(url(`/scenarios/${id}/duplicate`), { name: 'Variant' })).body.scenario;
    expect(named.name).toBe('Variant');
    const list = (await f.as.viewer.get(url(`/study-areas/${oz}/scenarios`))).body.scenarios.map((s: { name: string }) => s.name);
    expect(list).toEqual(expect.arrayContaining(['Original', 'Original (copy)', 'Variant']));
  });

  test('when a scenario is replaced, then who changed it and when are updated', async () => {
    const id = await create(oz, body(OZ, { name: 'Before' }));
    const before = (await f.as.viewer.get(url(`/scenarios/${id}`))).body.scenario;
    const after = (await f.as.owner.put(url(`/scenarios/${id}`), body(OZ, { name: 'After', notes: 'revised' }))).body.scenario;
    expect(after).toMatchObject({ name: 'After', notes: 'revised', createdBy: 'Editor', updatedBy: 'Owner' });
    expect(Date.parse(after.updatedAt)).toBeGreaterThanOrEqual(Date.parse(before.updatedAt));
  });

  test('when a phase has no survey, then uncertainty says there are no counts to draw from', async () => {
    const id = await create(oz, body(OZ));
    const u = (await f.as.viewer.get(url(`/scenarios/${id}/uncertainty?draws=100&seed=x`))).body;
    expect(u).toMatchObject({ prior: 0.5, draws: 100, seed: 'x', quantiles: [0.05, 0.95] });
    expect(u.phases[0].longRun).toBeNull();
    expect(u.phases[0].reason).toMatch(/typed in/);
  });
});

describe('demo scenarios', () => {
  test('when the demo is seeded twice, then Cinder Flat has its survey and two scenarios, Heron Bay one, and nothing is doubled', async () => {
    await seedDemo(f.t.sequelize);
    await seedDemoScenarios(f.t.sequelize);
    const counts = await Scenario.count();
    await seedDemoScenarios(f.t.sequelize);
    expect(await Scenario.count()).toBe(counts);
    const grazing = await Scenario.findOne({ where: { name: 'Current grazing' }, include: [{ model: ScenarioPhaseRow, as: 'phases' }] });
    const rest = await Scenario.findOne({ where: { name: 'Two-year rest then rotation' }, include: [{ model: ScenarioPhaseRow, as: 'phases' }] });
    expect(grazing!.phases![0].surveyId).not.toBeNull();
    expect(rest!.phases!.map((p) => [p.fromStep, p.toStep])).toEqual([[0, 2], [2, null]]);
    expect(await Scenario.count({ where: { name: 'Current tidal regime' } })).toBe(1);
  });
});
