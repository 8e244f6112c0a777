import { describe, expect, it } from 'vitest';
import { unitsFor } from '../../../lib/units';
import { EMPTY_HEATING_WHAT_IF, parseHeatingWhatIf } from './heating-what-if';

describe('parseHeatingWhatIf', () => {
  it('sends nothing for an empty row: the farm climate and the defaults apply', () => {
    expect(parseHeatingWhatIf(EMPTY_HEATING_WHAT_IF, unitsFor('si'))).toEqual({ conditions: {}, errors: {} });
  });

  it('asks for a clear night and a drawn curtain only when ticked', () => {
    const parsed = parseHeatingWhatIf(
      { ...EMPTY_HEATING_WHAT_IF, clearSky: true, curtainClosed: true },
      unitsFor('si'),
    );
    expect(parsed.conditions).toEqual({ clearSky: true, curtainClosed: true });
  });

  it('turns a US design temperature into °C and names an out-of-range value instead of sending it', () => {
    // (−4 °F − 32) × 5/9 = −20 °C exactly
    const us = parseHeatingWhatIf({ ...EMPTY_HEATING_WHAT_IF, designOutdoor: '-4' }, unitsFor('us'));
    expect(us.conditions.designOutdoorC).toBeCloseTo(-20, 12);
    const wrong = parseHeatingWhatIf({ ...EMPTY_HEATING_WHAT_IF, insideRelativeHumidityPct: '150' }, unitsFor('si'));
    expect(wrong.conditions).toEqual({});
    expect(wrong.errors.insideRelativeHumidityPct).toMatch(/Between 5 and 100 %/);
  });
});
