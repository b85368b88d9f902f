import { reportSteps } from './reportSteps';

test('when a run has 50 steps, then the report maps steps 0, 25 and 50', () => {
  expect(reportSteps(50)).toEqual([0, 25, 50]);
});

test('when a run has 1 step, then the report maps steps 0 and 1 once each', () => {
  expect(reportSteps(1)).toEqual([0, 1]);
});
