import type { HouseGeometry } from '../geometry/house-geometry';
import type { ReferenceData } from '../reference-data.types';
import { quantityToken } from '../vocabulary';
import type { HeatLossCoefficients } from './heat-loss';
import { assumptionFromRow, type HeatingAssumption } from './heating-assumptions';
import type { HeatingConditions } from './heating-conditions';
import { skyConstants, skyRadiationLoss, type SkyLoss } from './sky-radiation';

/** Share of long-wave radiation above which a covering's clear-night loss earns a caution. */
const IR_TRANSPARENT_FROM = 0.2;

export interface ClearNightSky {
  loss: SkyLoss;
  /** the roof covering's thermal-infrared transmittance used (0 under a drawn curtain) */
  thermalIrTransmittance: number;
  assumptions: HeatingAssumption[];
  cautions: string[];
}

/**
 * The design night under a clear sky: the crop radiates through the roof covering to the sky
 * (heating/sky-radiation.ts). A drawn curtain is treated as opaque to long-wave radiation (common
 * practice, no source: aluminised and most woven curtain fabrics pass little of it).
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
  const thermalIrTransmittance = input.curtainClosed ? 0 : (roof.thermalIrTransmittance ?? 0);
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
  const [, clearRow, , cropRow, depressionRow] = constants.rows;
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
      ? assumptionFromRow(depressionRow!, 'sky.dewPointC', 'Outdoor dew point on the clear night', loss.dewPointC, '°C')
      : {
          key: 'sky.dewPointC',
          label: 'Outdoor dew point on the clear night',
          value: loss.dewPointC,
          unit: '°C',
          source: 'entered for this estimate',
          confidence: 'user-entered',
          overridden: true,
        },
    assumptionFromRow(clearRow!, 'sky.emissivity', 'Clear-sky emissivity', loss.skyEmissivity, 'fraction'),
    assumptionFromRow(clearRow!, 'sky.temperatureC', 'Sky temperature', loss.skyTemperatureC, '°C'),
    assumptionFromRow(
      cropRow!,
      'sky.cropEmissivity',
      'Long-wave emissivity of the crop',
      constants.cropEmissivity,
      'fraction',
    ),
  ];
  const cautions =
    thermalIrTransmittance >= IR_TRANSPARENT_FROM
      ? [
          `On a clear night the roof film passes long-wave radiation to a sky at about ` +
            `${quantityToken('temperature', loss.skyTemperatureC)}, adding ${quantityToken('power', loss.lossW)} to the ` +
            `loss. An IR-absorbing inner film, or a curtain drawn at night, stops most of it.`,
        ]
      : [];
  return { loss, thermalIrTransmittance, assumptions, cautions };
}
