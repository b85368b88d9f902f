import { analyzeChain } from '@/shared/markov/analysis';
import { createMatrix } from '@/shared/markov/matrix';

import { chainToJson } from './liveAnalysis';
import { chainReadings } from './readings';

const read = (rows: number[][]): string[] => chainReadings(chainToJson(analyzeChain(createMatrix(['Shrub', 'Grass', 'Bare'], rows))));

describe('chain readings in words', () => {
  test('a regular chain settles to one mix', () => {
    expect(read([[0.8, 0.2, 0], [0.1, 0.8, 0.1], [0, 0.5, 0.5]])).toEqual([
      'Every state can reach every other and the shares settle to one long-run mix, whatever the start cover.',
    ]);
  });

  test('two absorbing states: several closed groups, absorbing and transient named', () => {
    expect(read([[1, 0, 0], [0.2, 0.6, 0.2], [0, 0, 1]])).toEqual([
      'Several closed groups of states: Shrub and Bare. Once cover is inside one of them it never leaves, so there is no single long-run share: where the land ends up depends on where it starts. The shares each group settles to are listed below.',
      'Shrub and Bare are absorbing: a patch that gets there stays there (chance of staying 1).',
      'Grass is transient: cover leaves and does not come back, so in the long run it holds 0 %.',
    ]);
  });

  test('a cycle is periodic', () => {
    expect(read([[0, 1, 0], [0, 0, 1], [1, 0, 0]])).toEqual([
      '{Shrub, Grass, Bare} is periodic with period 3: shares keep cycling every 3 steps instead of settling. The long-run share is the average over a cycle, and there is no mixing time.',
    ]);
  });
});
