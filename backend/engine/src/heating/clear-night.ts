import type { HouseGeometry } from '../geometry/house-geometry';
import type { ReferenceData } from '../reference-data.types';
import { SURFACE_GROUPS, quantityToken, type SurfaceGroup } from '../vocabulary';
import type { HeatLossCoefficients } from './heat-loss';
import { assumptionFromRow, type HeatingAssumption } from './heating-assumptions';
import type { HeatingConditions } from './heating-conditions';
import { skyConstants, skyCoupling, skyRadiationLoss, type SkyLoss } from './sky-radiation';

/** Share of long-wave radiation above which a covering's clear-night loss earns a caution. */
const IR_TRANSPARENT_FROM = 0.2;

export interface ClearNightSky {
  /** radiation from the crop through the roof to the sky */
  loss: SkyLoss;
  /** how much colder the air seems to each covering's outer surface, K */
  coverCoolingK: Record<SurfaceGroup, number>;
  /** extra loss through the coverings from that cooling, W */
  coverW: number;
  /** both paths together, W */
  totalW: number;
  /** the roof covering's thermal-infrared transmittance used (0 under a drawn curtain) */
  thermalIrTransmittance: number;
  assumptions: HeatingAssumption[];
  cautions: string[];
}

/**
 * The design night under a clear sky (heating/sky-radiation.ts): the crop radiates through the roof
 * covering to the sky, and every covering's outer surface, seeing the sky instead of the air, loses
 * as if the air were colder by `coverCoolingK` (more loss through U; a colder inside surface). Both
 * paths come from `skyCoupling` (a drawn curtain is opaque to long-wave radiation there), the same
 * coupling the season applies hour by hour.
 */
export function clearNightSkyLoss(
  input: {
    conditions: HeatingConditions;
    curtainClosed: boolean;
    geometry: HouseGeometry;
    coefficients: HeatLossCoefficients;
  },
  ref: ReferenceData,
): ClearNightSky {
  const constants = skyConstants(ref);
  const roof = input.coefficients.rows.coverings.roof;
  const coupling = skyCoupling(input.coefficients, input.geometry.floorAreaM2, constants);
  const { thermalIrTransmittance } = coupling;
  const loss = skyRadiationLoss(
    {
      outdoorC: input.conditions.designOutdoorC,
      dewPointC: input.conditions.outdoorDewPointC ?? undefined,
      cloudCoverTenths: 0,
      floorAreaM2: input.geometry.floorAreaM2,
      thermalIrTransmittance,
    },
    constants,
  );
  const coverCoolingK = {} as Record<SurfaceGroup, number>;
  for (const group of SURFACE_GROUPS) coverCoolingK[group] = coupling.coverKPerWPerM2[group] * loss.deficitWPerM2;
  const coverW = coupling.coverM2 * loss.deficitWPerM2;
  const { clearSky: clearRow, crop: cropRow, depression: depressionRow, outsideFilm } = constants.rows;
  const assumptions: HeatingAssumption[] = [
    assumptionFromRow(
      { id: 'ir', source: String(roof.irSource ?? roof.source), confidence: roof.irConfidence ?? roof.confidence },
      'sky.thermalIrTransmittance',
      input.curtainClosed
        ? 'Long-wave share passed to the sky (curtain drawn: treated as opaque)'
        : `Long-wave share the roof passes to the sky (${roof.label})`,
      thermalIrTransmittance,
      'fraction',
    ),
    input.conditions.outdoorDewPointC === undefined || input.conditions.outdoorDewPointC === null
      ? assumptionFromRow(depressionRow, 'sky.dewPointC', 'Outdoor dew point on the clear night', loss.dewPointC, '°C')
      : {
          key: 'sky.dewPointC',
          label: 'Outdoor dew point on the clear night',
          value: loss.dewPointC,
          unit: '°C',
          source: 'entered for this estimate',
          confidence: 'user-entered',
          overridden: true,
        },
    assumptionFromRow(clearRow, 'sky.emissivity', 'Clear-sky emissivity', loss.skyEmissivity, 'fraction'),
    assumptionFromRow(clearRow, 'sky.temperatureC', 'Sky temperature', loss.skyTemperatureC, '°C'),
    assumptionFromRow(
      cropRow,
      'sky.cropEmissivity',
      'Long-wave emissivity of the crop',
      constants.cropEmissivity,
      'fraction',
    ),
    assumptionFromRow(
      { id: 'emissivity', source: String(roof.emissivitySource ?? roof.source), confidence: 'memory' },
      'sky.roofOuterEmissivity',
      `Long-wave emissivity of the roof's outer surface (${roof.label})`,
      roof.outerLongWaveEmissivity ?? 0,
      'fraction',
    ),
    assumptionFromRow(
      outsideFilm,
      'sky.roofCoolingK',
      'How much colder the air seems to the roof under the clear sky',
      coverCoolingK.roof,
      'K',
    ),
  ];
  const totalW = loss.lossW + coverW;
  const cautions =
    thermalIrTransmittance >= IR_TRANSPARENT_FROM
      ? [
          `On a clear night the roof film passes long-wave radiation to a sky at about ` +
            `${quantityToken('temperature', loss.skyTemperatureC)}, adding ${quantityToken('power', loss.lossW)} to the ` +
            `loss. An IR-absorbing inner film, or a curtain drawn at night, stops most of it.`,
        ]
      : [];
  return { loss, coverCoolingK, coverW, totalW, thermalIrTransmittance, assumptions, cautions };
}
