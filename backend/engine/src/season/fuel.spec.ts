import { loadReferenceData } from '../testing/reference-data';
import { type EngineInputError } from '../errors';
import { referenceTable } from '../reference-data.types';
import {
  fuelCautions,
  fuelCost,
  fuelForHeat,
  fuelRow,
  JOULES_PER_BTU,
  JOULES_PER_KWH,
  priceUnitLabel,
  validateFuelPrice,
  type FuelRow,
} from './fuel';

const ref = loadReferenceData();
const kWhFromBtu = (btu: number) => (btu * JOULES_PER_BTU) / JOULES_PER_KWH;

/** A fuel row with a publication's own heat content, for checking its arithmetic. */
function publishedFuel(id: string, unitUs: string, btuPerUnitUs: number): FuelRow {
  return {
    id,
    label: id,
    fuelFired: true,
    unitSi: 'unused',
    heatContentJPerUnitSi: 1,
    unitUs,
    heatContentBtuPerUnitUs: btuPerUnitUs,
    source: 'test',
    confidence: 'verified',
  };
}

describe('fuel heat contents in reference-data/fuels.json', () => {
  // US EIA "Energy explained – British thermal units": electricity 3,412 Btu/kWh; natural gas
  // 1,036 Btu/ft³ (2022); 1 therm = 100,000 Btu. EIA "about Btu" table: propane 91,333 Btu/gal,
  // heating oil 138,690 Btu/gal (a later EIA table 138,500; retailers quote EIA's 91,452 for propane).
  it('match EIA values', () => {
    expect(fuelRow(ref, 'electricity').heatContentBtuPerUnitUs).toBe(3412);
    expect(fuelRow(ref, 'natural-gas').heatContentBtuPerUnitUs).toBe(100_000);
    const propane = fuelRow(ref, 'propane').heatContentBtuPerUnitUs;
    expect(propane).toBeGreaterThanOrEqual(91_333);
    expect(propane).toBeLessThanOrEqual(91_452);
    const oil = fuelRow(ref, 'heating-oil').heatContentBtuPerUnitUs;
    expect(oil).toBeGreaterThanOrEqual(138_500);
    expect(oil).toBeLessThanOrEqual(138_690);
  });

  it('give SI heat contents equal to the US ones after unit conversion (natural gas: 1,036 Btu/ft³ per EIA)', () => {
    const gas = fuelRow(ref, 'natural-gas');
    const megajoulesPerCubicMetre = (1036 * JOULES_PER_BTU) / 0.0283168 / 1e6;
    expect(gas.heatContentJPerUnitSi / 1e6).toBeCloseTo(megajoulesPerCubicMetre, 1);
    for (const fuel of referenceTable<FuelRow>(ref, 'fuels').rows) {
      const quantity = fuelForHeat(10_000, fuel, 0.8);
      if (fuel.id === 'natural-gas') continue; // SI per m³, US per therm: not the same physical unit
      const siJ = quantity.quantitySi * fuel.heatContentJPerUnitSi;
      const usJ = quantity.quantityUs * fuel.heatContentBtuPerUnitUs * JOULES_PER_BTU;
      expect(Math.abs(siJ / usJ - 1)).toBeLessThan(0.002);
    }
  });

  it('electricity: 1 kWh of heat at 100 % is 1 kWh bought (SI definition)', () => {
    const quantity = fuelForHeat(1, fuelRow(ref, 'electricity'), 1);
    expect(quantity.quantitySi).toBeCloseTo(1, 12);
    expect(quantity.quantityUs).toBeCloseTo(3412.14 / 3412, 3);
  });
});

describe('fuel for heat', () => {
  // Bartok, Greenhouse Management, leaky roof vent: 672,000 Btu/day at 75 % heating-system
  // efficiency ≈ 6.5 gal No. 2 oil, 8.7 ccf natural gas or 9.7 gal propane; with the article's
  // heat contents 138,500 Btu/gal, 103,000 Btu/ccf, 92,500 Btu/gal: 6.47 / 8.70 / 9.69.
  it('reproduces the published fuel equivalents of 672,000 Btu at 75 %', () => {
    const heatKWh = kWhFromBtu(672_000);
    expect(fuelForHeat(heatKWh, publishedFuel('oil', 'US gal', 138_500), 0.75).quantityUs).toBeCloseTo(6.47, 2);
    expect(fuelForHeat(heatKWh, publishedFuel('gas', 'ccf', 103_000), 0.75).quantityUs).toBeCloseTo(8.7, 2);
    expect(fuelForHeat(heatKWh, publishedFuel('propane', 'US gal', 92_500), 0.75).quantityUs).toBeCloseTo(9.69, 2);
  });

  it('gives the same equivalents within 2 % with the reference table (EIA) heat contents', () => {
    const heatKWh = kWhFromBtu(672_000);
    const oil = fuelForHeat(heatKWh, fuelRow(ref, 'heating-oil'), 0.75).quantityUs;
    const propane = fuelForHeat(heatKWh, fuelRow(ref, 'propane'), 0.75).quantityUs;
    expect(Math.abs(oil / 6.47 - 1)).toBeLessThan(0.02);
    expect(Math.abs(propane / 9.69 - 1)).toBeLessThan(0.02);
  });

  // Univ. Wisconsin Extension "Greenhouses – Heat Loss": kneewall foam saves ≈ 400 gal fuel oil,
  // or 610 gal propane, or 558 therms natural gas a year (same useful heat, same efficiency).
  it('reproduces the published oil / propane / therm equivalence within 1.5 %', () => {
    const heatKWh = kWhFromBtu(400 * 138_500) * 0.8; // heat delivered by 400 gal at 80 %
    const propane = fuelForHeat(heatKWh, fuelRow(ref, 'propane'), 0.8).quantityUs;
    const therms = fuelForHeat(heatKWh, fuelRow(ref, 'natural-gas'), 0.8).quantityUs;
    expect(Math.abs(propane / 610 - 1)).toBeLessThan(0.015);
    expect(Math.abs(therms / 558 - 1)).toBeLessThan(0.015);
  });

  it('halves fuel when efficiency doubles', () => {
    const propane = fuelRow(ref, 'propane');
    expect(fuelForHeat(100, propane, 0.5).quantitySi).toBeCloseTo(2 * fuelForHeat(100, propane, 1).quantitySi, 9);
  });
});

describe('fuel cost', () => {
  it('costs the same whether the price is per US gallon or per litre', () => {
    const propane = fuelRow(ref, 'propane');
    const quantity = fuelForHeat(50_000, propane, 0.8);
    const perLitre = 0.6;
    const perGallon = perLitre * 3.785412;
    const costSi = fuelCost(quantity, { pricePerUnit: perLitre, priceUnit: 'si' });
    const costUs = fuelCost(quantity, { pricePerUnit: perGallon, priceUnit: 'us' });
    expect(Math.abs(costSi! / costUs! - 1)).toBeLessThan(0.001);
    expect(priceUnitLabel(propane, 'us')).toBe('US gal');
    expect(priceUnitLabel(propane, 'si')).toBe('L');
  });

  it('refuses a price without its unit and an unknown fuel, naming the field', () => {
    const field = (run: () => unknown) => {
      try {
        run();
      } catch (error) {
        return (error as EngineInputError).field;
      }
      return 'no error';
    };
    expect(field(() => validateFuelPrice({ fuelId: 'propane', pricePerUnit: 2, priceUnit: 'gal' as never }, ref))).toBe(
      'fuel.priceUnit',
    );
    expect(field(() => validateFuelPrice({ fuelId: 'coal', pricePerUnit: 2, priceUnit: 'us' }, ref))).toBe(
      'fuel.fuelId',
    );
    expect(field(() => validateFuelPrice({ fuelId: 'propane', pricePerUnit: -1, priceUnit: 'us' }, ref))).toBe(
      'fuel.pricePerUnit',
    );
  });

  it('warns about combustion gases for fuel-fired heaters and wiring for electric ones', () => {
    expect(fuelCautions(fuelRow(ref, 'propane')).join(' ')).toMatch(/carbon monoxide/);
    expect(fuelCautions(fuelRow(ref, 'propane')).join(' ')).toMatch(/local codes/);
    expect(fuelCautions(fuelRow(ref, 'electricity')).join(' ')).toMatch(/ground-fault/);
  });
});
