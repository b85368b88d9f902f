import { isBlock, splitBlock } from './pasteBlock';

const states = [
  { code: 'OW', name: 'Open water' },
  { code: 'LM', name: 'Low marsh' },
];

describe('isBlock', () => {
  test.each([
    ['0.5\t0.5', true],
    ['0.5\n0.5', true],
    ['0.5,0.5', true],
    ['0.25\n', false],
    ['0,3', false],
    ['0.3', false],
  ])('%j → %s', (text, expected) => {
    expect(isBlock(text)).toBe(expected);
  });
});

describe('splitBlock', () => {
  test('splits on tabs when there are any, keeping commas inside entries', () => {
    expect(splitBlock('0,5\t0,5\r\n1\t0\r\n', states)).toEqual([
      ['0,5', '0,5'],
      ['1', '0'],
    ]);
  });

  test('drops a header row and a label column that name the states', () => {
    expect(splitBlock('\tOW\tLM\nopen water\t0.9\t0.1\nLM\t0\t1', states)).toEqual([
      ['0.9', '0.1'],
      ['0', '1'],
    ]);
  });

  test('keeps a first row that is not all state labels', () => {
    expect(splitBlock('x,0.1\n0.2,0.8', states)).toEqual([
      ['x', '0.1'],
      ['0.2', '0.8'],
    ]);
  });
});
