import type { SurveyInspection } from '@/shared/schemas';

import { defaultMapping } from './defaultMapping';

const states = [
  { code: 'SS', name: 'Shrub steppe', colour: '#E69F00' },
  { code: 'BS', name: 'Bare soil', colour: '#999999' },
];

const inspection: SurveyInspection = {
  fileName: 'plots.csv',
  rowCount: 4,
  sampleRows: [],
  columns: [
    { name: 'cover', distinctCount: 3, values: [{ value: 'sagebrush', count: 2 }, { value: 'bare soil', count: 1 }, { value: 'n/v', count: 1 }] },
    { name: 'class', distinctCount: 2, values: [{ value: 'ss', count: 3 }, { value: 'x', count: 1 }] },
  ],
  guessedColumns: { plot: null, time: null, state: 'cover' },
  suggestedMapping: { sagebrush: 'SS', 'bare soil': 'BS', 'n/v': null },
};

test('takes the server suggestion for the guessed column', () => {
  expect(defaultMapping(inspection, 'cover', states)).toEqual({ sagebrush: 'SS', 'bare soil': 'BS', 'n/v': null });
});

test('matches labels of another column by code or name, leaving the rest unmapped', () => {
  expect(defaultMapping(inspection, 'class', states)).toEqual({ ss: 'SS', x: null });
});
