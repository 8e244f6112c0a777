import type { ClimateProposal, SiteClimate } from '../../api/types';

/**
 * What any climate proposal offers, from weather history or from the farm's own temperature log:
 * the design values at both percentiles, monthly normals and the climate it would save. A log
 * has no humidity, so its wet bulb may be missing (null).
 */
export interface ProposalValues extends Pick<
  ClimateProposal,
  | 'winterDesign996C'
  | 'winterDesign99C'
  | 'summerDesign04C'
  | 'summerDesign1C'
  | 'summerCoincidentWetBulb04C'
  | 'summerCoincidentWetBulb1C'
  | 'summerDailyRangeK'
  | 'monthly'
> {
  proposedClimate: Omit<ClimateProposal['proposedClimate'], 'summerDesignWetBulbC'> & {
    summerDesignWetBulbC: number | null;
  };
}

export type HeatingPercentile = '99.6' | '99';
export type CoolingPercentile = '1' | '0.4';

export interface ProposalChoice {
  heating: HeatingPercentile;
  cooling: CoolingPercentile;
  /** take the design temperatures (and daily range) from the history */
  keepDesign: boolean;
  /** take the twelve monthly normals from the history */
  keepMonthly: boolean;
  /** a wet bulb the user typed where the proposal has none (a log) and the farm has none yet, °C */
  wetBulbC?: number | null;
}

export const DEFAULT_CHOICE: ProposalChoice = { heating: '99.6', cooling: '1', keepDesign: true, keepMonthly: true };

/** The proposal's design values at the chosen percentiles (SI). */
export function proposedDesign(
  proposal: ProposalValues,
  choice: Pick<ProposalChoice, 'heating' | 'cooling' | 'wetBulbC'>,
) {
  const wetBulb =
    choice.cooling === '1'
      ? (proposal.summerCoincidentWetBulb1C ?? proposal.summerCoincidentWetBulb04C)
      : (proposal.summerCoincidentWetBulb04C ?? proposal.summerCoincidentWetBulb1C);
  return {
    winterDesignC: choice.heating === '99.6' ? proposal.winterDesign996C : proposal.winterDesign99C,
    summerDesignC: choice.cooling === '1' ? proposal.summerDesign1C : proposal.summerDesign04C,
    summerDesignWetBulbC: wetBulb ?? proposal.proposedClimate.summerDesignWetBulbC ?? choice.wetBulbC ?? null,
    summerDailyRangeK: proposal.summerDailyRangeK,
  };
}

/**
 * The climate to save: what the user chose to keep from the history, the rest as it is now.
 * Null when the farm has no climate yet and the user did not keep both parts (nothing to fill
 * the other part with).
 */
export function climateFromProposal(
  proposal: ProposalValues,
  current: SiteClimate | null,
  choice: ProposalChoice,
): SiteClimate | null {
  if (!choice.keepDesign && !choice.keepMonthly) return null;
  if (!current && !(choice.keepDesign && choice.keepMonthly)) return null;
  const proposed = proposedDesign(proposal, choice);
  if (choice.keepDesign && proposed.summerDesignWetBulbC === null) return null;
  const design = choice.keepDesign
    ? { ...proposed, summerDesignWetBulbC: proposed.summerDesignWetBulbC! }
    : {
        winterDesignC: current!.winterDesignC,
        summerDesignC: current!.summerDesignC,
        summerDesignWetBulbC: current!.summerDesignWetBulbC,
        summerDailyRangeK: current!.summerDailyRangeK,
      };
  const monthly = choice.keepMonthly ? proposal.proposedClimate.monthly : current!.monthly;
  const history = proposal.proposedClimate.sourceNote ?? 'weather history';
  const parts = [
    choice.keepDesign ? `design temperatures (${choice.heating} % heating, ${choice.cooling} % cooling)` : null,
    choice.keepMonthly ? 'monthly normals' : null,
  ].filter(Boolean);
  const kept =
    current?.sourceNote && !(choice.keepDesign && choice.keepMonthly) ? ` Other values: ${current.sourceNote}` : '';
  const sourceNote = `${parts.join(' and ')} from ${history.replace(/: 99\.6 % heating and 1 % cooling design values$/, '')}.${kept}`;
  return { ...design, monthly, sourceNote: sourceNote.slice(0, 1000) };
}
