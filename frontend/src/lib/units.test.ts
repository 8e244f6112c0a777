import { describe, expect, it } from 'vitest';
import {
  formatProse,
  formatQuantity,
  fromDisplay,
  joulesToTherms,
  quantityOfSiUnit,
  rangeInDisplay,
  toDisplay,
  toInputString,
  unitLabel,
  type Quantity,
} from './units';

/**
 * Conversion factors are checked against NIST Special Publication 811 (2008 edition),
 * "Guide for the Use of the International System of Units (SI)", Appendix B.8 (factors in
 * alphabetical order) and B.9 (by kind of quantity). SP 811 prints most factors to 7 significant
 * digits, so inexact ones are compared to that precision; exact definitions are compared exactly.
 */
describe('units: conversion factors (NIST SP 811, Appendix B)', () => {
  it('1 ft = 0.3048 m exactly (SP 811 B.8 "foot")', () => {
    expect(fromDisplay('length', 1, 'us')).toBe(0.3048);
    expect(toDisplay('length', 0.3048, 'us')).toBeCloseTo(1, 12);
  });

  it('1 ft² = 9.290 304 E-02 m² exactly (SP 811 B.8 "square foot")', () => {
    expect(fromDisplay('area', 1, 'us')).toBeCloseTo(0.09290304, 15);
  });

  it('1 ft³ = 2.831 685 E-02 m³ (SP 811 B.8 "cubic foot")', () => {
    expect(fromDisplay('volume', 1, 'us')).toBeCloseTo(0.02831685, 8);
  });

  it('t/°C = (t/°F − 32)/1.8 (SP 811 B.9 "temperature")', () => {
    expect(fromDisplay('temperature', 32, 'us')).toBeCloseTo(0, 12);
    expect(fromDisplay('temperature', 212, 'us')).toBeCloseTo(100, 12);
    expect(toDisplay('temperature', -40, 'us')).toBeCloseTo(-40, 12);
  });

  it('a temperature interval of 1 °F = 5/9 K (SP 811 B.8 "degree Fahrenheit (temperature interval)")', () => {
    expect(fromDisplay('temperatureDifference', 1, 'us')).toBeCloseTo(0.5555556, 7);
    expect(toDisplay('temperatureDifference', 10, 'us')).toBeCloseTo(18, 12);
  });

  it('1 Btu_IT/h = 2.930 711 E-01 W (SP 811 B.8 "British thermal unit_IT per hour")', () => {
    expect(fromDisplay('power', 1, 'us')).toBeCloseTo(0.2930711, 7);
  });

  it('SI power is entered and shown in kW while the API holds W', () => {
    expect(fromDisplay('power', 73, 'si')).toBe(73_000);
    expect(unitLabel('power', 'si')).toBe('kW');
  });

  it('1 Btu_IT/(h·ft²·°F) = 5.678 263 W/(m²·K) (SP 811 B.8 "British thermal unit_IT per hour square foot degree Fahrenheit")', () => {
    expect(fromDisplay('uValue', 1, 'us')).toBeCloseTo(5.678263, 6);
  });

  it('1 ft³/min = 4.719 474 E-04 m³/s (SP 811 B.8 "cubic foot per minute")', () => {
    expect(fromDisplay('airFlow', 1, 'us')).toBeCloseTo(4.719474e-4, 10);
  });

  it('1 cfm/ft² = 0.00508 m³/(s·m²), i.e. 0.3048 m / 60 s (derived from the exact foot)', () => {
    expect(fromDisplay('airFlowPerFloorArea', 1, 'us')).toBeCloseTo(0.00508, 15);
  });

  it('1 kWh = 3.6 E+06 J (SP 811 B.8 "kilowatt hour")', () => {
    expect(fromDisplay('energy', 1, 'si')).toBe(3.6e6);
  });

  it('1 MMBtu = 10^6 Btu_IT = 1.055 056 E+09 J (SP 811 B.8 "British thermal unit_IT" = 1.055 056 E+03 J)', () => {
    expect(fromDisplay('energy', 1, 'us')).toBeCloseTo(1.055056e9, -3);
  });

  it('1 therm (EC) = 1.055 06 E+08 J (SP 811 B.8 "therm (EC)")', () => {
    expect(joulesToTherms(1.05506e8)).toBeCloseTo(1, 5);
  });

  it('heat content: 1 Btu_IT/US gal = 278.7163 J/L, from SP 811 B.8 "British thermal unit_IT" (1.055 056 E+03 J) and "gallon (U.S.)" (3.785 412 E-03 m³)', () => {
    // The API gives liquid fuels in J per litre.
    expect(fromDisplay('heatContentPerLiquidVolume', 1, 'us')).toBeCloseTo(1.055056e3 / 3.785412, 3);
    expect(fromDisplay('heatContentPerLiquidVolume', 1, 'us')).toBeCloseTo(278.7163, 3);
  });

  it('heat content: 1 Btu_IT/ft³ = 3.725 895 E+04 J/m³ (SP 811 B.8 "British thermal unit_IT per cubic foot")', () => {
    expect(fromDisplay('heatContentPerVolume', 1, 'us')).toBeCloseTo(37258.95, 2);
  });

  it('heat content: 1 Btu_IT/lb = 2326 J/kg exactly (SP 811 B.8 "British thermal unit_IT per pound")', () => {
    expect(fromDisplay('heatContentPerMass', 1, 'us')).toBeCloseTo(2326, 9);
  });

  it('irradiance stays W/m² in both systems', () => {
    expect(toDisplay('irradiance', 800, 'us')).toBe(800);
    expect(unitLabel('irradiance', 'us')).toBe('W/m²');
  });

  it('round trip SI → display → SI returns the value for every quantity and system', () => {
    const quantities: Quantity[] = [
      'length',
      'area',
      'smallArea',
      'volume',
      'temperature',
      'temperatureDifference',
      'power',
      'uValue',
      'airFlow',
      'airFlowPerFloorArea',
      'energy',
      'irradiance',
      'heatContentPerVolume',
      'heatContentPerLiquidVolume',
      'heatContentPerMass',
    ];
    for (const quantity of quantities) {
      for (const system of ['si', 'us'] as const) {
        for (const siValue of [-12.5, 0.001, 1, 9.144, 123456.789]) {
          const back = fromDisplay(quantity, toDisplay(quantity, siValue, system), system);
          expect(back, `${quantity} ${system} ${siValue}`).toBeCloseTo(siValue, 9);
        }
      }
    }
  });
});

describe('units: display', () => {
  it('shows a 30 ft span as 9.14 m and 30.0 ft', () => {
    expect(formatQuantity('length', 9.144, 'si')).toBe('9.14 m');
    expect(formatQuantity('length', 9.144, 'us')).toBe('30.0 ft');
  });

  it('groups thousands and can drop the unit', () => {
    expect(formatQuantity('power', 73_267.77, 'us', { withoutUnit: true })).toBe('250,000');
    expect(formatQuantity('power', null, 'si')).toBe('—');
  });

  it('input strings drop trailing zeros and float noise', () => {
    expect(toInputString('length', 9.144, 'us')).toBe('30');
    expect(toInputString('temperature', 15.5, 'us')).toBe('59.9');
    expect(toInputString('length', undefined, 'si')).toBe('');
  });

  it('narrows an SI range inward to the shown decimals so typed values stay inside it', () => {
    // 2 m = 6.5617 ft, 20 m = 65.6168 ft; shown to 1 decimal
    expect(rangeInDisplay('length', { min: 2, max: 20 }, 'us')).toEqual({ min: 6.6, max: 65.6 });
    // −5 °C = 23 °F and 40 °C = 104 °F exactly: no rounding inward past float noise
    expect(rangeInDisplay('temperature', { min: -5, max: 40 }, 'us')).toEqual({ min: 23, max: 104 });
    expect(rangeInDisplay('length', { min: 2, max: 20 }, 'si')).toEqual({ min: 2, max: 20 });
  });
});

describe('units: quantities of the estimate panels (NIST SP 811, Appendix B.8)', () => {
  it('1 Btu_IT/(h·ft·°F) = 1.730 735 W/(m·K) (SP 811 B.8 "British thermal unit_IT foot per hour square foot degree Fahrenheit", same dimension)', () => {
    expect(fromDisplay('perimeterFactor', 1, 'us')).toBeCloseTo(1.730735, 6);
  });

  it('1 Btu_IT/(h·°F) = 0.527 527 W/K (from SP 811 B.8 "British thermal unit_IT per hour" 2.930 711 E-01 W × 1.8)', () => {
    expect(fromDisplay('conductance', 1, 'us')).toBeCloseTo(0.2930711 * 1.8, 6);
  });

  it('1 ft/min = 5.08 E-03 m/s exactly (SP 811 B.8 "foot per minute")', () => {
    expect(fromDisplay('velocity', 1, 'us')).toBeCloseTo(0.00508, 15);
  });

  it('1 footcandle = 1.076 391 E+01 lx (SP 811 B.8 "footcandle")', () => {
    expect(fromDisplay('illuminance', 1, 'us')).toBeCloseTo(10.76391, 5);
  });

  it('1 psi = 6.894 757 E+03 Pa (SP 811 B.8 "pound-force per square inch")', () => {
    expect(fromDisplay('pressure', 1, 'us')).toBeCloseTo(6894.757, 3);
    expect(fromDisplay('pressure', 1, 'si')).toBe(1000);
  });

  it('1 lb/ft³ = 1.601 846 E+01 kg/m³ (SP 811 B.8 "pound per cubic foot")', () => {
    expect(fromDisplay('density', 1, 'us')).toBeCloseTo(16.01846, 5);
  });

  it('1 Btu_IT/(lb·°F) = 4.1868 E+03 J/(kg·K) exactly (SP 811 B.8 "British thermal unit_IT per pound degree Fahrenheit")', () => {
    expect(fromDisplay('specificHeat', 1, 'us')).toBeCloseTo(4186.8, 9);
  });

  it('combustion-air area: 1 in² per 2,500 Btu/h is 8.805 E-07 m²/W, from SP 811 B.8 "square inch" (6.4516 E-04 m²) and "British thermal unit_IT per hour"', () => {
    expect(fromDisplay('areaPerPower', 0.4, 'us')).toBeCloseTo(6.4516e-4 / (2500 * 0.2930711), 12);
    expect(toDisplay('areaPerPower', 8.805e-7, 'si')).toBeCloseTo(8.805, 9); // cm² per kW
  });

  it('round trip for the new quantities in both systems', () => {
    const quantities: Quantity[] = [
      'perimeterFactor',
      'conductance',
      'velocity',
      'illuminance',
      'pressure',
      'density',
      'specificHeat',
      'areaPerPower',
    ];
    for (const quantity of quantities) {
      for (const system of ['si', 'us'] as const) {
        const back = fromDisplay(quantity, toDisplay(quantity, 1.2345, system), system);
        expect(back, `${quantity} ${system}`).toBeCloseTo(1.2345, 9);
      }
    }
  });

  it("maps the API's unit strings to quantities and leaves system-free units alone", () => {
    expect(quantityOfSiUnit('W/(m²·K)')).toBe('uValue');
    expect(quantityOfSiUnit('°C')).toBe('temperature');
    expect(quantityOfSiUnit('m³/(s·m²)')).toBe('airFlowPerFloorArea');
    expect(quantityOfSiUnit('1/h')).toBeNull();
    expect(quantityOfSiUnit('fraction')).toBeNull();
  });
});

describe('units: display of values that round to zero', () => {
  it('shows −0.04 °C as 0.0 °C, not -0.0 °C', () => {
    expect(formatQuantity('temperature', -0.04, 'si')).toBe('0.0 °C');
    expect(formatQuantity('temperature', -0.06, 'si')).toBe('-0.1 °C');
  });
});

describe('units: engine prose with {{kind:valueSI}} quantity tokens', () => {
  const caution =
    'Installed output {{power:70300}} is short; chimneys at least {{length:0.61}} above the ridge; holds {{temperature:-18.4}}.';

  it('writes every token in SI', () => {
    expect(formatProse(caution, 'si')).toBe(
      'Installed output 70.3 kW is short; chimneys at least 0.61 m above the ridge; holds -18.4 °C.',
    );
    expect(formatProse('lowered by {{temperatureDifference:2}}', 'si')).toBe('lowered by 2.0 K');
    expect(formatProse('{{energy:3600000000}}', 'si')).toBe('1,000 kWh'); // 1 kWh = 3.6 E+06 J
    expect(formatProse('{{smallArea:0.0619}}', 'si')).toBe('619 cm²');
    expect(formatProse('{{areaPerPower:8.805e-7}}', 'si')).toBe('8.8 cm²/kW');
  });

  it('writes every token in US customary units (factors as checked above, NIST SP 811 B.8)', () => {
    // 70 300 W ÷ 0.293 071 1 W per Btu/h = 239 873.6 Btu/h; 0.61 m ÷ 0.3048 = 2.001 ft; −18.4 × 1.8 + 32 = −1.12 °F
    expect(formatProse(caution, 'us')).toBe(
      'Installed output 239,874 Btu/h is short; chimneys at least 2.0 ft above the ridge; holds -1.1 °F.',
    );
    expect(formatProse('lowered by {{temperatureDifference:2}}', 'us')).toBe('lowered by 3.6 °F'); // 2 K × 1.8
    expect(formatProse('{{energy:3600000000}}', 'us')).toBe('3.41 MMBtu'); // 3.6 E+09 J ÷ 1.055 056 E+09 J
    expect(formatProse('{{smallArea:0.0619}}', 'us')).toBe('96 in²'); // 0.0619 m² ÷ 6.4516 E-04 m²
    expect(formatProse('{{areaPerPower:8.805e-7}}', 'us')).toBe('0.40 in² per 1,000 Btu/h'); // see the check above
  });

  it('shows an unknown kind as its bare number, never the braces', () => {
    expect(formatProse('about {{furlongs:3}} away', 'us')).toBe('about 3 away');
  });

  it('leaves text without tokens, and malformed braces, as they are', () => {
    expect(formatProse('NIOSH limit 35 ppm over 8 h; 12 %.', 'us')).toBe('NIOSH limit 35 ppm over 8 h; 12 %.');
    expect(formatProse('{{power:}} {power:5}', 'us')).toBe('{{power:}} {power:5}');
    expect(formatProse(null, 'si')).toBe('');
  });
});
