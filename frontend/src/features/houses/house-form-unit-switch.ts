import type { Quantity, Units } from '../../lib/units';
import type { HouseFormValues } from './house-form-values';

/**
 * The user switched unit systems with edits in the form: re-express each typed number in the new
 * unit. A field still showing its stored value takes the new unit's stored-value string (so it
 * still counts as untouched); an edited one is converted, with one extra decimal.
 */
export function convertFormValues(
  values: HouseFormValues,
  previousInitial: HouseFormValues,
  nextInitial: HouseFormValues,
  from: Units,
  to: Units,
): HouseFormValues {
  const convert = (
    quantity: Quantity,
    typed: string,
    wasInitial: string | undefined,
    nowInitial: string | undefined,
  ) => {
    if (wasInitial !== undefined && nowInitial !== undefined && typed === wasInitial) return nowInitial;
    const number = Number(typed);
    if (typed.trim() === '' || !Number.isFinite(number)) return typed;
    const converted = to.toDisplay(quantity, from.fromDisplay(quantity, number));
    const factor = 10 ** (to.decimals(quantity) + 1);
    return String(Math.round(converted * factor) / factor);
  };
  const group = <K extends string>(
    quantity: Quantity,
    typed: Record<K, string>,
    wasInitial: Record<K, string>,
    nowInitial: Record<K, string>,
  ) =>
    Object.fromEntries(
      (Object.keys(typed) as K[]).map((key) => [key, convert(quantity, typed[key], wasInitial[key], nowInitial[key])]),
    ) as Record<K, string>;

  return {
    ...values,
    widthM: convert('length', values.widthM, previousInitial.widthM, nextInitial.widthM),
    lengthM: convert('length', values.lengthM, previousInitial.lengthM, nextInitial.lengthM),
    eaveHeightM: convert('length', values.eaveHeightM, previousInitial.eaveHeightM, nextInitial.eaveHeightM),
    ridgeHeightM: convert('length', values.ridgeHeightM, previousInitial.ridgeHeightM, nextInitial.ridgeHeightM),
    kneewallHeightM: convert(
      'length',
      values.kneewallHeightM,
      previousInitial.kneewallHeightM,
      nextInitial.kneewallHeightM,
    ),
    coveringUOverridesWPerM2K: group(
      'uValue',
      values.coveringUOverridesWPerM2K,
      previousInitial.coveringUOverridesWPerM2K,
      nextInitial.coveringUOverridesWPerM2K,
    ),
    heaters: values.heaters.map((heater, index) => ({
      ...heater,
      ratedInputW: convert(
        'power',
        heater.ratedInputW,
        previousInitial.heaters[index]?.ratedInputW,
        nextInitial.heaters[index]?.ratedInputW,
      ),
    })),
    exhaustFans: {
      ...values.exhaustFans,
      capacityEachM3PerS: convert(
        'airFlow',
        values.exhaustFans.capacityEachM3PerS,
        previousInitial.exhaustFans.capacityEachM3PerS,
        nextInitial.exhaustFans.capacityEachM3PerS,
      ),
    },
    inletAreaM2: convert('area', values.inletAreaM2, previousInitial.inletAreaM2, nextInitial.inletAreaM2),
    setpoints: group('temperature', values.setpoints, previousInitial.setpoints, nextInitial.setpoints),
    lamps: {
      ...values.lamps,
      powerDensityWPerM2: convert(
        'powerPerFloorArea',
        values.lamps.powerDensityWPerM2,
        previousInitial.lamps.powerDensityWPerM2,
        nextInitial.lamps.powerDensityWPerM2,
      ),
    },
  };
}
