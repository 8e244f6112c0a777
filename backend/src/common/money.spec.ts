import { currencyDecimals, formatMoney, moneyHeading, plainAmount } from './money';

describe('money in the farm currency', () => {
  it('writes amounts with the currency through Intl.NumberFormat', () => {
    expect(formatMoney(1234.5, 'USD')).toBe('$1,234.50');
    expect(formatMoney(1234.5, 'EUR')).toBe('€1,234.50');
    expect(formatMoney(1234.5, 'CAD')).toBe('CA$1,234.50');
    expect(formatMoney(1234.5, 'USD', 0)).toBe('$1,235');
    expect(formatMoney(null, 'USD')).toBe('—');
  });

  it("uses the currency's own decimals (ISO 4217 minor units: JPY has none)", () => {
    expect(currencyDecimals('USD')).toBe(2);
    expect(currencyDecimals('JPY')).toBe(0);
    expect(formatMoney(1234.5, 'JPY')).toBe('¥1,235');
    expect(plainAmount(1234.5, 'JPY')).toBe('1235');
    expect(plainAmount(1234.5, 'EUR')).toBe('1234.50');
    expect(plainAmount(null, 'EUR')).toBeNull();
  });

  it('names the currency in a column heading', () => {
    expect(moneyHeading('Cost', 'EUR')).toBe('Cost (EUR)');
  });
});
