import { describe, expect, it } from 'vitest';
import type { SiteClimate } from '../../api/types';
import { PROPOSAL, proposalMonthly as monthly } from '../../test/weather-fixtures';
import { climateFromProposal, DEFAULT_CHOICE, proposedDesign } from './weather-proposal';

const CURRENT: SiteClimate = {
  winterDesignC: -27,
  summerDesignC: 31,
  summerDesignWetBulbC: 23,
  summerDailyRangeK: 12,
  monthly: monthly(0),
  sourceNote: 'typed from a handbook table',
};

describe('climate from a weather-history proposal', () => {
  it('takes the chosen percentiles with their coincident wet bulb', () => {
    expect(proposedDesign(PROPOSAL, { heating: '99', cooling: '0.4' })).toEqual({
      winterDesignC: -26.1,
      summerDesignC: 32.4,
      summerDesignWetBulbC: 22.8,
      summerDailyRangeK: 11.3,
    });
  });

  it('keeps the current monthly normals when only the design values are kept, and says so', () => {
    const saved = climateFromProposal(PROPOSAL, CURRENT, { ...DEFAULT_CHOICE, keepMonthly: false })!;
    expect(saved.winterDesignC).toBe(-29.5);
    expect(saved.monthly).toEqual(CURRENT.monthly);
    expect(saved.sourceNote).toMatch(/^design temperatures \(99\.6 % heating, 1 % cooling\) from INVENTED/);
    expect(saved.sourceNote).toMatch(/Other values: typed from a handbook table/);
  });

  it('keeps the current design values when only the months are kept', () => {
    const saved = climateFromProposal(PROPOSAL, CURRENT, { ...DEFAULT_CHOICE, keepDesign: false })!;
    expect(saved.winterDesignC).toBe(-27);
    expect(saved.summerDesignWetBulbC).toBe(23);
    expect(saved.monthly).toEqual(PROPOSAL.proposedClimate.monthly);
  });

  it('saves nothing when nothing is kept, or when a farm without a climate keeps only a part', () => {
    expect(
      climateFromProposal(PROPOSAL, CURRENT, { ...DEFAULT_CHOICE, keepDesign: false, keepMonthly: false }),
    ).toBeNull();
    expect(climateFromProposal(PROPOSAL, null, { ...DEFAULT_CHOICE, keepMonthly: false })).toBeNull();
    expect(climateFromProposal(PROPOSAL, null, DEFAULT_CHOICE)).not.toBeNull();
  });
});
