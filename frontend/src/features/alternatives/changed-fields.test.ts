import { describe, expect, it } from 'vitest';
import { changedFieldWords, changesSentence } from './changed-fields';

describe('what an alternative changes, in words', () => {
  it('names the fields a grower knows, never the API path', () => {
    expect(changesSentence(['coverings.roof', 'coverings.sidewalls'])).toBe('Changes roof covering, sidewall covering');
    expect(changedFieldWords('setpoints.nightHeatingC')).toBe('night heating setpoint');
    expect(changedFieldWords('heaters.0.ratedInputW')).toBe('heaters');
  });

  it('names lamps in plain words: added whole they are "supplemental lamps", one value changed is named', () => {
    expect(
      changesSentence([
        'lamps.lampTypeId',
        'lamps.powerDensityWPerM2',
        'lamps.hoursPerDayByMonth',
        'lamps.heatToHouseFraction',
      ]),
    ).toBe('Changes supplemental lamps');
    expect(changesSentence(['lamps'])).toBe('Changes supplemental lamps');
    expect(changesSentence(['lamps.powerDensityWPerM2', 'curtainId'])).toBe('Changes lamp power, curtain');
    expect(changesSentence(['lamps.hoursPerDayByMonth'])).toBe('Changes lamp hours');
  });

  it('spells out a field it has no words for, without its unit suffix, and says when nothing changes', () => {
    expect(changedFieldWords('someNewLengthM')).toBe('some new length');
    expect(changesSentence([])).toBe('No field changes');
  });
});
