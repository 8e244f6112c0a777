import type { HouseSpec, Lamps } from '@thermbay/engine/house.types';
import type { HouseDto } from './dto/house.dto';
import type { House } from './models/house.model';

/** A stored house as the engine takes it: plain data, SI, nothing from the ORM. */
export function houseToSpec(house: House | HouseDto): HouseSpec & { lamps: Lamps | null } {
  return {
    shape: house.shape,
    spans: house.spans,
    widthM: house.widthM,
    lengthM: house.lengthM,
    eaveHeightM: house.eaveHeightM,
    ridgeHeightM: house.ridgeHeightM,
    coverings: { ...house.coverings },
    coveringUOverridesWPerM2K: { ...(house.coveringUOverridesWPerM2K ?? {}) },
    airLeakageClassId: house.airLeakageClassId,
    airChangesPerHourOverride: house.airChangesPerHourOverride ?? null,
    perimeterInsulated: house.perimeterInsulated,
    curtainId: house.curtainId ?? null,
    shadeCloth: house.shadeCloth
      ? { solarTransmittance: house.shadeCloth.solarTransmittance, months: [...house.shadeCloth.months] }
      : null,
    kneewallHeightM: house.kneewallHeightM ?? null,
    kneewallId: house.kneewallId ?? null,
    heaters: house.heaters.map((h) => ({ ...h })),
    exhaustFans: { ...house.exhaustFans },
    inletAreaM2: house.inletAreaM2,
    setpoints: { ...house.setpoints },
    lamps: house.lamps
      ? {
          lampTypeId: house.lamps.lampTypeId ?? null,
          powerDensityWPerM2: house.lamps.powerDensityWPerM2,
          hoursPerDayByMonth: [...house.lamps.hoursPerDayByMonth],
          heatToHouseFraction: house.lamps.heatToHouseFraction,
        }
      : null,
  };
}

export function houseToDto(house: House): HouseDto {
  return {
    id: house.id,
    farmId: house.farmId,
    name: house.name,
    notes: house.notes ?? null,
    ...houseToSpec(house),
    coveringUOverridesWPerM2K: house.coveringUOverridesWPerM2K ?? {},
    airChangesPerHourOverride: house.airChangesPerHourOverride ?? null,
    curtainId: house.curtainId ?? null,
    shadeCloth: house.shadeCloth
      ? { solarTransmittance: house.shadeCloth.solarTransmittance, months: [...house.shadeCloth.months] }
      : null,
    version: house.version,
    kneewallHeightM: house.kneewallHeightM ?? null,
    kneewallId: house.kneewallId ?? null,
    createdAt: house.createdAt.toISOString(),
    updatedAt: house.updatedAt.toISOString(),
  };
}
