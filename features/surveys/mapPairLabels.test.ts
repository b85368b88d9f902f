import type { MapPairInspection } from '@/shared/schemas';

import { mapPairLabels, sharedProperties } from './mapPairLabels';

const inspection: MapPairInspection = {
  earlier: {
    featureCount: 3,
    warnings: [],
    properties: [
      { name: 'veg', values: [{ value: 'sage', count: 2 }, { value: 'grass', count: 1 }] },
      { name: 'id', values: [{ value: '1', count: 3 }] },
    ],
  },
  later: { featureCount: 2, warnings: [], properties: [{ name: 'veg', values: [{ value: 'sage', count: 1 }, { value: 'bare', count: 1 }] }] },
};

test('offers only the attributes both maps carry', () => {
  expect(sharedProperties(inspection)).toEqual(['veg']);
});

test('merges the values of both maps, adding their polygon counts', () => {
  expect(mapPairLabels(inspection, 'veg')).toEqual([{ value: 'sage', count: 3 }, { value: 'grass', count: 1 }, { value: 'bare', count: 1 }]);
});
