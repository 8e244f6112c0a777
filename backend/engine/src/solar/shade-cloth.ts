import { EngineInputError, requireInRange } from '../errors';
import type { HouseSpec, ShadeCloth } from '../house.types';
import { BOUNDS, monthsInWords } from '../vocabulary';

export { MONTH_NAMES, monthsInWords } from '../vocabulary';

/**
 * A house's shade cloth: in the months it is in place it passes `solarTransmittance` of the sun
 * that comes through the roof, heat and light alike; in the other months it passes everything.
 * Shade only ever takes light away: every factor here lies in [0, 1].
 */

/** The house's cloth checked (EngineInputError naming `house.shadeCloth.…`), or null for none. */
export function validateShadeCloth(house: Pick<HouseSpec, 'shadeCloth'>): ShadeCloth | null {
  const cloth = house.shadeCloth;
  if (cloth === undefined || cloth === null) return null;
  if (typeof cloth !== 'object' || Array.isArray(cloth)) {
    throw new EngineInputError('house.shadeCloth', 'house.shadeCloth must be an object or null');
  }
  const { min, max } = BOUNDS.shadeClothTransmittance;
  requireInRange('house.shadeCloth.solarTransmittance', cloth.solarTransmittance, min, max);
  if (!Array.isArray(cloth.months)) {
    throw new EngineInputError('house.shadeCloth.months', 'house.shadeCloth.months must be a list of months 1–12');
  }
  const seen = new Set<number>();
  cloth.months.forEach((month, index) => {
    const field = `house.shadeCloth.months[${index}]`;
    requireInRange(field, month, BOUNDS.shadeClothMonth.min, BOUNDS.shadeClothMonth.max);
    if (!Number.isInteger(month)) throw new EngineInputError(field, `${field} must be a whole month, 1–12`);
    if (seen.has(month)) throw new EngineInputError(field, `${field} names month ${month} twice`);
    seen.add(month);
  });
  return cloth;
}

/** The share of the sun through the roof that reaches the crop in a month (1 = January): the cloth's when in place, else 1. */
export function shadeTransmittanceInMonth(house: Pick<HouseSpec, 'shadeCloth'>, month: number): number {
  const cloth = validateShadeCloth(house);
  return cloth !== null && cloth.months.includes(month) ? cloth.solarTransmittance : 1;
}

/** The same for January … December, index 0 = January. */
export function shadeTransmittanceByMonth(house: Pick<HouseSpec, 'shadeCloth'>): number[] {
  return Array.from({ length: 12 }, (_, index) => shadeTransmittanceInMonth(house, index + 1));
}

/** "a shade cloth passing 50 % of the sun, in place May–September" (or "no shade cloth"). */
export function shadeClothInWords(cloth: ShadeCloth | null | undefined): string {
  if (!cloth) return 'no shade cloth';
  const percent = Math.round(cloth.solarTransmittance * 1000) / 10;
  return `a shade cloth passing ${percent} % of the sun, in place ${monthsInWords(cloth.months)}`;
}
