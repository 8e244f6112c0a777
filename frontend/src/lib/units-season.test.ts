import { describe, expect, it } from 'vitest';
import {
  formatFuelQuantity,
  currencyCodes,
  currencyDecimals,
  currencySymbol,
  formatMoney,
  formatQuantity,
  fromDisplay,
  kWhToTherms,
  toDisplay,
  unitLabel,
  unitsFor,
} from './units';

/**
 * The season quantities. Factors are checked against NIST Special Publication 811 (2008),
 * Appendix B.8: "kilowatt hour" = 3.6 E+06 J (exact), "British thermal unit_IT" = 1.055 056 E+03 J,
 * "therm (EC)" = 1.055 06 E+08 J, "degree Fahrenheit (temperature interval)" = 5/9 K.
 */
describe('units: season quantities (NIST SP 811, Appendix B.8)', () => {
  it('energy given in kWh shows as kWh (SI) and MMBtu (US): 1 MMBtu = 10^6 Btu_IT = 293.0711 kWh', () => {
    expect(unitLabel('energyKWh', 'si')).toBe('kWh');
    expect(unitLabel('energyKWh', 'us')).toBe('MMBtu');
    // 1.055 056 E+09 J ÷ 3.6 E+06 J/kWh = 293.0711 kWh
    expect(fromDisplay('energyKWh', 1, 'us')).toBeCloseTo(293.0711, 3);
    expect(toDisplay('energyKWh', 293.07107, 'us')).toBeCloseTo(1, 6);
    expect(formatQuantity('energyKWh', 141_081.37, 'si')).toBe('141,081 kWh');
    expect(formatQuantity('energyKWh', 141_081.37, 'us')).toBe('481.39 MMBtu');
  });

  it('1 therm (EC) = 1.055 06 E+08 J = 29.3072 kWh', () => {
    expect(kWhToTherms(29.30722)).toBeCloseTo(1, 5);
  });

  it('degree-days: 1 °F·day = 5/9 K·day', () => {
    expect(toDisplay('degreeDays', 100, 'us')).toBeCloseTo(180, 12);
    expect(fromDisplay('degreeDays', 9, 'us')).toBeCloseTo(5, 12);
    expect(unitLabel('degreeDays', 'us')).toBe('°F·d');
  });

  it('a share 0–1 is shown as a percentage in both systems', () => {
    expect(formatQuantity('fraction', 0.786, 'us')).toBe('79 %');
    expect(fromDisplay('fraction', 45, 'si')).toBeCloseTo(0.45, 12);
  });

  it('round trip SI → display → SI for the season quantities', () => {
    for (const quantity of ['energyKWh', 'degreeDays', 'fraction', 'durationHours'] as const) {
      for (const system of ['si', 'us'] as const) {
        for (const value of [-3.5, 0.25, 1, 12_345.678]) {
          expect(fromDisplay(quantity, toDisplay(quantity, value, system), system)).toBeCloseTo(value, 9);
        }
      }
    }
  });
});

describe('units: fuel quantities and money', () => {
  const propane = { unitSi: 'L', unitUs: 'US gal' };
  const amount = { fuelQuantitySi: 24_939.7456, fuelQuantityUs: 6_588.3856 };

  it("picks the API's quantity in the fuel's unit for the user's system (no re-conversion)", () => {
    expect(formatFuelQuantity(amount, propane, 'si')).toBe('24,940 L');
    expect(formatFuelQuantity(amount, propane, 'us')).toBe('6,588 US gal');
    expect(unitsFor('us').fuelUnit({ unitSi: 'm³', unitUs: 'therm' })).toBe('therm');
    expect(unitsFor('si').fuelValue(amount)).toBe(24_939.7456);
  });

  it('shows small fuel amounts with decimals and missing ones as a dash', () => {
    expect(formatFuelQuantity({ fuelQuantitySi: 12.345, fuelQuantityUs: 3.2612 }, propane, 'us')).toBe('3.3 US gal');
    expect(formatFuelQuantity({ fuelQuantitySi: 0.4567, fuelQuantityUs: 0.12 }, propane, 'si')).toBe('0.46 L');
    expect(formatFuelQuantity(null, propane, 'si')).toBe('—');
  });

  it("formats money in the farm's currency with Intl.NumberFormat, in the currency's own decimals", () => {
    expect(formatMoney(10_541.4169, 'USD')).toBe('$10,541.42');
    expect(formatMoney(36_800.06, 'USD', 0)).toBe('$36,800');
    expect(formatMoney(10_541.4169, 'EUR')).toBe('€10,541.42');
    expect(formatMoney(10_541.4169, 'CAD')).toBe('CA$10,541.42');
    // ISO 4217 gives the yen no minor unit
    expect(currencyDecimals('JPY')).toBe(0);
    expect(formatMoney(10_541.4169, 'JPY')).toBe('¥10,541');
    expect(currencySymbol('EUR')).toBe('€');
    expect(currencyCodes()).toEqual(expect.arrayContaining(['USD', 'EUR', 'CAD', 'MXN']));
    expect(formatMoney(null, 'USD')).toBe('—');
  });
});
