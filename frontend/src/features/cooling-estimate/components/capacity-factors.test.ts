import { describe, expect, it } from 'vitest';
import type { CoolingEstimate } from '../../../api/types';
import { unitsFor } from '../../../lib/units';
import { demoHouseBCooling } from '../../../test/estimate-fixtures';
import { lightSentence } from './capacity-factors';

const si = unitsFor('si');

function withCloth(inPlaceOnDesignDate: boolean): CoolingEstimate {
  return {
    ...demoHouseBCooling,
    interiorLight: {
      from: 'design day',
      unshadedLux: 90_000,
      shadeTransmittance: inPlaceOnDesignDate ? 0.5 : 1,
      lux: inPlaceOnDesignDate ? 45_000 : 90_000,
    },
    shadeCloth: { solarTransmittance: 0.5, months: [5, 6, 7, 8, 9], inPlaceOnDesignDate },
  };
}

describe('where the light factor’s light comes from, in words', () => {
  it('names a cloth in place with its months and the share it lets through', () => {
    expect(lightSentence(withCloth(true), si)).toBe(
      "Light at the crop 45,000 lx: the design day's clear-sky sun through the roof, the same sun as the hour-by-hour day, with the shade cloth (in place May–September) letting 50 % through.",
    );
  });

  it('says when the cloth is not up on the design date', () => {
    expect(lightSentence(withCloth(false), si)).toContain(
      'with the shade cloth not in place on the design date (only May–September)',
    );
  });

  it('names an entered light', () => {
    const entered: CoolingEstimate = {
      ...demoHouseBCooling,
      interiorLight: { from: 'entered', unshadedLux: 60_000, shadeTransmittance: 1, lux: 60_000 },
    };
    expect(lightSentence(entered, si)).toBe(
      'Light at the crop 60,000 lx: the peak light entered for the crop under the roof, with no shade cloth.',
    );
  });
});
