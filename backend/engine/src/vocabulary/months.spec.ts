import { monthsInWords } from './months';

describe('months in words', () => {
  it.each<[number[], string]>([
    [[5, 6, 7, 8, 9], 'May–September'],
    [[9, 5, 7, 6, 8], 'May–September'],
    [[6, 8], 'June, August'],
    [[6, 7], 'June, July'],
    [[7], 'July'],
    [[11, 12, 1, 2], 'November–February'],
    [[12, 1], 'December, January'],
    [[1, 2, 3, 7, 12], 'December–March, July'],
    [[], 'no month'],
    [[1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], 'all year'],
  ])('%j → %s', (months, words) => {
    expect(monthsInWords(months)).toBe(words);
  });
});
