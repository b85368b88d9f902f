import type { CoverState, ScenarioDetail } from '@/shared/schemas';

import { formFromScenario, newScenarioForm, phaseStarts, scenarioBody, scenarioFormReducer, type ScenarioForm, type ScenarioFormAction } from './scenarioFormState';

const states: CoverState[] = [
  { code: 'OW', name: 'Open water', colour: '#56B4E9' },
  { code: 'LM', name: 'Low marsh', colour: '#009E73' },
];

const apply = (form: ScenarioForm, ...actions: ScenarioFormAction[]): ScenarioForm => actions.reduce(scenarioFormReducer, form);

describe('phases', () => {
  test('when a phase is added, then the last one gets an end 5 steps on and the new one runs to the end with a copy of its matrix', () => {
    const form = apply(newScenarioForm(states), { type: 'phaseMatrix', index: 0, action: { type: 'edit', from: 0, to: 0, text: '0.9' } }, { type: 'addPhase' });
    expect(form.phases.map((p) => p.endText)).toEqual(['5', '']);
    expect(phaseStarts(form)).toEqual([0, 5]);
    expect(form.phases[1].matrix.cells[0][0]).toBe('0.9');
    expect(form.phases[1].matrix.past).toEqual([]);
  });

  test('starts follow the typed ends, so the ranges stay contiguous', () => {
    const form = apply(newScenarioForm(states), { type: 'addPhase' }, { type: 'addPhase' }, { type: 'phaseEnd', index: 0, text: '2' });
    expect(phaseStarts(form)).toEqual([0, 2, 10]);
  });

  test('at most five phases', () => {
    const form = apply(newScenarioForm(states), ...Array.from({ length: 7 }, (): ScenarioFormAction => ({ type: 'addPhase' })));
    expect(form.phases).toHaveLength(5);
  });

  test('when a middle phase is removed, then the phase before takes over its steps; the last one stays open-ended', () => {
    let form = apply(newScenarioForm(states), { type: 'addPhase' }, { type: 'addPhase' }, { type: 'phaseEnd', index: 0, text: '2' });
    form = apply(form, { type: 'removePhase', index: 1 });
    expect(form.phases.map((p) => p.endText)).toEqual(['10', '']);
    form = apply(form, { type: 'removePhase', index: 1 });
    expect(form.phases.map((p) => p.endText)).toEqual(['']);
    expect(apply(form, { type: 'removePhase', index: 0 }).phases).toHaveLength(1);
  });
});

describe('the request body', () => {
  test('of a two-phase scenario tiles the steps and keeps survey links', () => {
    const saved: ScenarioDetail = {
      id: 4, studyAreaId: 1, name: 'Rest then rotate', notes: '', yearsPerStep: 2, phaseCount: 2, surveyIds: [9],
      createdBy: 'Ed', createdAt: '2025-01-01T00:00:00Z', updatedBy: 'Ed', updatedAt: '2025-01-01T00:00:00Z',
      startCover: { source: 'study-area' },
      phases: [
        { fromStep: 0, toStep: 3, matrix: [[1, 0], [0.5, 0.5]], surveyId: null, survey: null },
        { fromStep: 3, toStep: null, matrix: [[0.9, 0.1], [0.2, 0.8]], surveyId: 9, survey: { id: 9, name: 'Plots 2012–2023' } },
      ],
      stateCodes: ['OW', 'LM'],
      fitsStudyArea: true,
    };
    const result = scenarioBody(formFromScenario(saved, states));
    expect(result).toEqual({
      ok: true,
      body: {
        name: 'Rest then rotate',
        notes: '',
        yearsPerStep: 2,
        startCover: { source: 'study-area' },
        phases: [
          { fromStep: 0, toStep: 3, matrix: [[1, 0], [0.5, 0.5]], surveyId: null },
          { fromStep: 3, toStep: null, matrix: [[0.9, 0.1], [0.2, 0.8]], surveyId: 9 },
        ],
      },
    });
  });

  test('is held back while an entry is not a number or an end step is missing', () => {
    const form = apply(
      newScenarioForm(states),
      { type: 'addPhase' },
      { type: 'phaseEnd', index: 0, text: '' },
      { type: 'phaseMatrix', index: 1, action: { type: 'edit', from: 1, to: 0, text: 'x' } },
      { type: 'years', text: 'two' },
    );
    expect(scenarioBody(form)).toEqual({
      ok: false,
      problems: {
        years: 'Years per step must be a number, e.g. 1 or 0.5',
        phases: { 0: ['Phase 1 needs an end step (a whole number)'], 1: ['Phase 2: every entry must be a number'] },
      },
    });
  });

  test('sends rows that do not sum to 1, so that the server names them', () => {
    const form = apply(newScenarioForm(states), { type: 'name', text: 'Odd' }, { type: 'phaseMatrix', index: 0, action: { type: 'edit', from: 0, to: 1, text: '0.5' } });
    const result = scenarioBody(form);
    expect(result.ok && result.body.phases[0].matrix).toEqual([[1, 0.5], [0, 1]]);
  });

  test('own start proportions start uniform', () => {
    const form = apply(newScenarioForm(states), { type: 'startSource', source: 'proportions' });
    const result = scenarioBody(form);
    expect(result.ok && result.body.startCover).toEqual({ source: 'proportions', method: 'random', proportions: [0.5, 0.5] });
  });
});
