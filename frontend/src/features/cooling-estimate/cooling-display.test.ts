import { describe, expect, it } from 'vitest';
import { coolingSourceWord, formatFixed } from './cooling-display';

describe('coolingSourceWord', () => {
  it('says where a condition came from in the reader’s words, not the API’s', () => {
    expect(coolingSourceWord('request')).toBe('typed here');
    expect(coolingSourceWord('calendar default')).toBe('mid-summer default');
    expect(coolingSourceWord('reference data')).toBe('default');
    expect(coolingSourceWord('farm climate')).toBe('farm climate');
  });
});

describe('formatFixed', () => {
  it('gives exactly the decimals asked for, padding with zeros', () => {
    expect(formatFixed(1.5, 3)).toBe('1.500');
    expect(formatFixed(12, 1)).toBe('12.0');
  });

  it('rounds to the decimals asked for and groups thousands', () => {
    expect(formatFixed(0.04567, 2)).toBe('0.05');
    expect(formatFixed(1234.56, 1)).toBe('1,234.6');
  });
});
