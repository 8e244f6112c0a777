import { maxOf, minOf } from './numbers';

describe('maxOf / minOf', () => {
  it('agree with Math.max / Math.min on short lists, empty ones included', () => {
    for (const list of [[], [3], [1, 5, -2], [-0.5, -7.25]]) {
      expect(maxOf(list)).toBe(Math.max(...list));
      expect(minOf(list)).toBe(Math.min(...list));
    }
  });

  it('carry NaN through as Math.max does', () => {
    expect(maxOf([1, NaN, 3])).toBeNaN();
    expect(minOf([1, NaN, 3])).toBeNaN();
  });

  it('read a list far longer than the call stack allows as arguments', () => {
    const long = Array.from({ length: 1_000_000 }, (_, index) => (index * 7919) % 1_000_003);
    expect(() => Math.max(...long)).toThrow(RangeError);
    expect(maxOf(long)).toBe(long.reduce((a, b) => (b > a ? b : a)));
    expect(minOf(long)).toBe(0);
  });
});
