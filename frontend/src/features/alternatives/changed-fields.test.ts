import { describe, expect, it } from 'vitest';
import { changedFieldWords, changesSentence } from './changed-fields';

describe('what an alternative changes, in words', () => {
  it('names the fields a grower knows, never the API path', () => {
    expect(changesSentence(['coverings.roof', 'coverings.sidewalls'])).toBe('Changes roof covering, sidewall covering');
    expect(changedFieldWords('setpoints.nightHeatingC')).toBe('night heating setpoint');
    expect(changedFieldWords('heaters.0.ratedInputW')).toBe('heaters');
  });

  it('names the shade cloth in plain words, whether an alternative adds, removes or changes it', () => {
    // adding a cloth changes both its share and its months: one word for both
    expect(changesSentence(['shadeCloth.solarTransmittance', 'shadeCloth.months'])).toBe('Changes shade cloth');
    // removing it names the whole field
    expect(changesSentence(['shadeCloth'])).toBe('Changes shade cloth');
    // a denser cloth, or other months
    expect(changesSentence(['shadeCloth.solarTransmittance'])).toBe('Changes shade cloth');
    expect(changesSentence(['shadeCloth.months', 'setpoints.coolingC'])).toBe(
      'Changes months the shade cloth is up, cooling setpoint',
    );
    for (const path of ['shadeCloth', 'shadeCloth.solarTransmittance', 'shadeCloth.months']) {
      expect(changedFieldWords(path)).not.toMatch(/[A-Z]|\./);
    }
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
