import { quantityToken } from '../vocabulary';
import type { ReferenceData } from '../reference-data.types';
import { requiredRow, type SafetyRow } from './heating-reference';

// Quantities in cautions are tokens (see ../vocabulary/quantities.ts): the reader's units show them.
const kW = (watts: number) => quantityToken('power', watts);
const metres = (lengthM: number) => quantityToken('length', lengthM);

interface CombustionProductsRow extends SafetyRow {
  waterVapourVolumesPerGasVolume: number;
  carbonDioxideVolumesPerGasVolume: number;
}

export interface CombustionSafety {
  cautions: string[];
  /** the reference rows behind the cautions, with the value each one gives */
  rows: Array<{ row: SafetyRow; value: number | string; unit: string }>;
}

/**
 * The cautions that go with fuel-fired heaters: combustion air, venting, carbon monoxide, crop
 * injury, licensed installers. Unvented heaters (a group whose type is `unvented`) get the strong
 * ones: everything they burn stays in the house air, and their fresh-air inlet is sized by the
 * published rule (free area per watt of input, reference-data/safety.json).
 */
export function combustionSafety(
  fuelFiredInputW: number,
  unventedInputW: number,
  ref: ReferenceData,
): CombustionSafety {
  const safety = <Row extends SafetyRow = SafetyRow>(id: string) => requiredRow<Row>(ref, 'safety', id);
  const inlet = safety('combustion-air-inlet');
  const aboveRidge = safety('chimney-above-ridge');
  const aboveRoof = safety('chimney-above-roof-edge');
  const clearance = safety('chimney-clearance-horizontal');
  const coLimit = safety('co-niosh-rel');
  const ethylene = safety('ethylene-crop-injury');
  const sulfurDioxide = safety('so2-crop-injury');
  const inletPerW = inlet.valueM2PerW as number;

  const cautions: string[] = [];
  const rows: CombustionSafety['rows'] = [];
  if (unventedInputW > 0) {
    const unvented = safety('unvented-heater-products');
    const products = safety<CombustionProductsRow>('natural-gas-combustion-products');
    cautions.push(
      `UNVENTED HEATERS (${kW(unventedInputW)} input): every product of combustion stays in the house air. ` +
        `Carbon monoxide can kill people; carbon dioxide and water vapour build up (burning natural gas gives about ${products.carbonDioxideVolumesPerGasVolume} volume of carbon dioxide and ${products.waterVapourVolumesPerGasVolume} volumes of water vapour per volume of gas), ` +
        'wetting the crop and feeding disease. Fit carbon monoxide alarms and never run them in a closed house with people inside.',
      `Unvented heaters injure crops: ethylene from incomplete combustion harms sensitive plants from about ${ethylene.valuePpm} ppm (bud and flower drop, twisted leaves) and nitrogen dioxide scorches foliage. ` +
        'They are not recommended even as back-up; replace them with vented units.',
      `Where an unvented heater must run, give it a fresh-air inlet of at least ${quantityToken('areaPerPower', inletPerW)} of input, ` +
        `about ${quantityToken('smallArea', unventedInputW * inletPerW)} for the ${kW(unventedInputW)} entered, and check local codes first: many forbid unvented heaters in buildings people work in.`,
    );
    rows.push({ row: unvented, value: 'not recommended', unit: '' });
    rows.push({ row: products, value: products.waterVapourVolumesPerGasVolume, unit: 'm³ water vapour per m³ gas' });
  }
  cautions.push(
    `Fuel-fired heaters need a fresh-air inlet for combustion: a free area of at least about ${quantityToken('areaPerPower', inletPerW)} of heater input ` +
      `(about ${quantityToken('smallArea', fuelFiredInputW * inletPerW)} for the ${kW(fuelFiredInputW)} entered); local codes may require more.`,
    `Vent every fuel-fired heater to the outside through a sound flue. Chimneys: at least ${metres(aboveRidge.valueM as number)} above the ridge, ${metres(aboveRoof.valueM as number)} above the roof where they pass through, ` +
      `and ${metres(clearance.valueM as number)} horizontally from the nearest roof; exhaust fans can pull flue gas back into the house.`,
    `Carbon monoxide from a faulty, unvented or back-drafting heater can kill people. Fit carbon monoxide alarms (NIOSH recommended limit ${coLimit.valuePpm} ppm over 8 h).`,
    `Incomplete combustion releases ethylene, which injures sensitive crops from about ${ethylene.valuePpm} ppm, and sulfur-bearing fuels release sulfur dioxide, injurious from about ${sulfurDioxide.valuePpm} ppm. ` +
      'A yellow or orange flame signals trouble; unvented heaters are not recommended even as back-up.',
    'Have fuel-fired equipment sized, installed and serviced by licensed installers under local codes.',
  );
  for (const row of [inlet, aboveRidge, aboveRoof, clearance, coLimit, ethylene, sulfurDioxide]) {
    const value = row.valueM2PerW ?? row.valueM ?? row.valuePpm;
    const unit = row.valueM2PerW !== undefined ? 'm²/W' : row.valueM !== undefined ? 'm' : 'ppm';
    rows.push({ row, value: value as number, unit });
  }
  return { cautions, rows };
}
