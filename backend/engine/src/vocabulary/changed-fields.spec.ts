import { alternativeChangesSentence, changedFieldWords, changesSentence } from '.';

describe('what an alternative changes, in words', () => {
  it('names the fields a grower knows, never the API path', () => {
    expect(changesSentence(['coverings.roof', 'coverings.sidewalls'])).toBe('Changes roof covering, sidewall covering');
    expect(changedFieldWords('setpoints.nightHeatingC')).toBe('night heating setpoint');
    expect(changedFieldWords('heaters.0.ratedInputW')).toBe('heaters');
    expect(changedFieldWords('exhaustFans.count')).toBe('number of fans');
  });

  it('names each field once and adds the production calendar when the alternative brings its own', () => {
    expect(changesSentence(['heaters.0.count', 'heaters.1.count'])).toBe('Changes heaters');
    expect(alternativeChangesSentence(['curtainId'], true)).toBe('Changes curtain, production calendar');
    expect(alternativeChangesSentence([], true)).toBe('Changes production calendar');
    expect(alternativeChangesSentence([], false)).toBe('No field changes');
  });

  it('names lamps: a whole set added reads "supplemental lamps", one changed value is named', () => {
    const added = [
      'lamps.lampTypeId',
      'lamps.powerDensityWPerM2',
      'lamps.hoursPerDayByMonth',
      'lamps.heatToHouseFraction',
    ];
    expect(changesSentence(added)).toBe('Changes supplemental lamps');
    expect(alternativeChangesSentence(['lamps'], false)).toBe('Changes supplemental lamps');
    expect(changesSentence(['lamps.powerDensityWPerM2', 'curtainId'])).toBe('Changes lamp power, curtain');
    expect(changesSentence(['lamps.hoursPerDayByMonth'])).toBe('Changes lamp hours');
  });

  it('spells out a field it has no words for, without its unit suffix', () => {
    expect(changedFieldWords('someNewLengthM')).toBe('some new length');
  });
});
