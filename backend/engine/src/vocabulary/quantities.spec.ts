import fc from 'fast-check';
import { hasQuantityTokens, proseToPlainSi, q, QUANTITY_KINDS, QUANTITY_TOKEN_PATTERN, quantityToken } from '.';

describe('quantityToken', () => {
  it('writes {{kind:valueSI}} with the value unscaled', () => {
    expect(quantityToken('power', 70_300)).toBe('{{power:70300}}');
    expect(quantityToken('length', 0.61)).toBe('{{length:0.61}}');
    expect(quantityToken('temperature', -18.4)).toBe('{{temperature:-18.4}}');
    expect(quantityToken('temperatureDifference', 2)).toBe('{{temperatureDifference:2}}');
    expect(q('airFlow', 5.5)).toBe('{{airFlow:5.5}}');
  });

  it('keeps six significant digits, drops float noise and negative zero', () => {
    expect(quantityToken('power', 70_312.345678)).toBe('{{power:70312.3}}');
    expect(quantityToken('area', 0.1 + 0.2)).toBe('{{area:0.3}}');
    expect(quantityToken('temperature', -0)).toBe('{{temperature:0}}');
    // 8.8 cm² per kW is 8.8E-07 m²/W: exponent notation survives the round trip
    expect(quantityToken('areaPerPower', 8.8e-7)).toBe('{{areaPerPower:8.8e-7}}');
  });

  it('writes a dash for a value that is not a finite number', () => {
    expect(quantityToken('temperature', Number.NaN)).toBe('—');
    expect(quantityToken('power', Number.POSITIVE_INFINITY)).toBe('—');
  });

  it('refuses a kind outside the closed list', () => {
    expect(() => quantityToken('furlongs' as never, 1)).toThrow(/unknown quantity kind/);
  });

  it('every token it writes matches the pattern the readers use, value intact to 6 digits', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...QUANTITY_KINDS),
        fc.double({ min: -1e12, max: 1e12, noNaN: true, noDefaultInfinity: true }),
        (kind, value) => {
          const token = quantityToken(kind, value);
          const match = new RegExp(`^${QUANTITY_TOKEN_PATTERN.source}$`).exec(token);
          expect(match).not.toBeNull();
          expect(match![1]).toBe(kind);
          const parsed = Number(match![2]);
          expect(Math.abs(parsed - value)).toBeLessThanOrEqual(Math.abs(value) * 5e-6 + Number.MIN_VALUE);
        },
      ),
    );
  });
});

describe('proseToPlainSi', () => {
  it('writes each kind in the SI units the app shows SI readers', () => {
    expect(proseToPlainSi(`Installed output ${q('power', 70_300)} is ${q('power', 40_800)} short.`)).toBe(
      'Installed output 70.3 kW is 40.8 kW short.',
    );
    expect(proseToPlainSi(`at least ${q('length', 0.61)} above the ridge`)).toBe('at least 0.61 m above the ridge');
    expect(proseToPlainSi(q('temperature', -18.4))).toBe('-18.4 °C');
    expect(proseToPlainSi(q('temperatureDifference', 2))).toBe('2.0 K');
    expect(proseToPlainSi(q('area', 5.57))).toBe('5.6 m²'); // one decimal, as the app shows SI readers
    expect(proseToPlainSi(q('airFlow', 12.345))).toBe('12.35 m³/s');
    // energy tokens hold joules: 3.6 MJ = 1 kWh (definition)
    expect(proseToPlainSi(q('energy', 1234 * 3.6e6))).toBe('1,234 kWh');
    // 8.8E-07 m²/W = 8.8 cm²/kW (1 cm² = 1E-04 m², 1 kW = 1E+03 W)
    expect(proseToPlainSi(q('areaPerPower', 8.8e-7))).toBe('8.8 cm²/kW');
    expect(proseToPlainSi(q('smallArea', 0.0619))).toBe('619 cm²');
  });

  it('shows an unknown kind as its bare number, never with braces', () => {
    expect(proseToPlainSi('about {{furlongs:3}} away')).toBe('about 3 away');
  });

  it('leaves text without tokens alone', () => {
    const text = 'Heat loss 12 % higher; NIOSH limit 35 ppm.';
    expect(proseToPlainSi(text)).toBe(text);
    expect(hasQuantityTokens(text)).toBe(false);
    expect(hasQuantityTokens(`a ${q('power', 1)} b`)).toBe(true);
  });

  it('renders every token of any sentence: no braces remain', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.constantFrom(...QUANTITY_KINDS), fc.double({ min: -1e9, max: 1e9, noNaN: true })), {
          maxLength: 5,
        }),
        (parts) => {
          const sentence = parts.map(([kind, value]) => `x ${quantityToken(kind, value)}`).join(', ');
          expect(proseToPlainSi(sentence)).not.toMatch(/\{\{|\}\}/);
        },
      ),
    );
  });
});
