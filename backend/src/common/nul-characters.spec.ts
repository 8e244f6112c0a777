import { nulCharacterProblems } from './nul-characters';

describe('nulCharacterProblems', () => {
  it('names every string holding a NUL character by its path, at any depth', () => {
    expect(
      nulCharacterProblems({ name: 'ok', notes: 'a\u0000b', heaters: [{ fuelId: 'gas' }, { fuelId: '\u0000' }] }),
    ).toEqual([
      { field: 'notes', message: 'notes must not contain a NUL character' },
      { field: 'heaters[1].fuelId', message: 'heaters[1].fuelId must not contain a NUL character' },
    ]);
  });

  it('passes ordinary text, numbers and empty bodies', () => {
    expect(nulCharacterProblems({ name: 'Serre nº 2 — 温室', widthM: 9.1, tags: ['a', null] })).toEqual([]);
    expect(nulCharacterProblems(undefined)).toEqual([]);
    expect(nulCharacterProblems('\\0 is two characters, not a NUL')).toEqual([]);
  });

  it('stops after 20 problems', () => {
    expect(nulCharacterProblems(Array.from({ length: 50 }, () => '\u0000'))).toHaveLength(20);
  });
});
