import type { ClimateProposal } from '../api/types';

/** A weather-history proposal as the API answers it (values invented for tests). */
export const proposalMonthly = (offset: number) =>
  Array.from({ length: 12 }, (_unused, index) => ({
    month: index + 1,
    meanDailyMinC: index - 10 + offset,
    meanDailyMaxC: index + offset,
    clearness: 0.5,
  }));

export const PROPOSAL: ClimateProposal = {
  farmId: 3,
  fromYear: 2016,
  toYear: 2025,
  source: {
    standIn: true,
    serviceUrl: null,
    note: 'The weather here is INVENTED by the local stand-in',
    defaultFromYear: 2016,
    defaultToYear: 2025,
    lastCompleteYear: 2025,
  },
  gridLatitudeDeg: 45.5,
  gridLongitudeDeg: -94.2,
  yearsUsed: [{ year: 2024, hourCount: 8784, missingHourCount: 0, missingShare: 0 }],
  yearsLeftOut: [
    { year: 2025, hourCount: 8760, missingHourCount: 1000, missingShare: 0.114, reason: '11.4 % missing' },
  ],
  hoursUsed: 8784,
  winterDesign996C: -29.5,
  winterDesign99C: -26.1,
  summerDesign04C: 32.4,
  summerDesign1C: 30.2,
  summerCoincidentWetBulb04C: 22.8,
  summerCoincidentWetBulb1C: 21.9,
  summerDailyRangeK: 11.3,
  monthly: proposalMonthly(1).map((m) => ({ ...m, dayCount: 30 })),
  proposedClimate: {
    winterDesignC: -29.5,
    summerDesignC: 30.2,
    summerDesignWetBulbC: 21.9,
    summerDailyRangeK: 11.3,
    monthly: proposalMonthly(1),
    sourceNote: 'INVENTED weather from the local stand-in, 2024: 99.6 % heating and 1 % cooling design values',
  },
  currentClimate: null,
};
