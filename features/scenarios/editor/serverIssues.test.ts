import { groupScenarioIssues } from './serverIssues';

test('the server reasons go to the field or phase their path names', () => {
  expect(
    groupScenarioIssues([
      { path: 'name', message: 'name must not be empty' },
      { path: 'phases.1.matrix.0', message: "phase 2: row 'SS' sums to 0.9" },
      { path: 'phases.1.fromStep', message: 'phase 2 starts at step 3' },
      { path: 'phases', message: 'a scenario can have at most 5 phases' },
      { path: 'startCover.proportions', message: 'proportions must be ≤ 1' },
    ]),
  ).toEqual({
    name: ['Name must not be empty'],
    notes: [],
    yearsPerStep: [],
    startCover: ['Proportions must be ≤ 1'],
    phases: { 1: ["Phase 2: row 'SS' sums to 0.9", 'Phase 2 starts at step 3'] },
    other: ['A scenario can have at most 5 phases'],
  });
});
