import { parse } from 'csv-parse/sync';
import { csvField, UTF8_BOM } from './budget-csv';

const readBack = (line: string): string[] => parse(line, { bom: true })[0] as string[];

describe('csvField', () => {
  it('quotes every field, and csv-parse reads back what was written', () => {
    const cells = ['House 1', 'a "quoted" name', 'comma, inside', 'line\nbreak', '12.5', '-3', 'm³ – °C', ''];
    const line = cells.map(csvField).join(',');
    expect(line.split(',')[0]).toBe('"House 1"');
    expect(readBack(line)).toEqual(cells);
  });

  it('neutralises text that a spreadsheet would run as a formula, after whitespace and in full-width forms', () => {
    const risky = [
      '=1+1',
      '+SUM(A1)',
      '-2+3',
      '@cmd',
      '\t=1',
      '\r=1',
      '  =HYPERLINK("x")',
      '\u3000=1',
      '＝1+1',
      '＋1',
      '－1',
      '＠x',
    ];
    const read = readBack(risky.map(csvField).join(','));
    read.forEach((cell, index) => expect(cell).toBe(`'${risky[index]}`));
  });

  it('leaves plain numbers, negative ones included, as numbers', () => {
    expect(readBack(['-12.5', '0', '7'].map(csvField).join(','))).toEqual(['-12.5', '0', '7']);
  });

  it('writes null as an empty field', () => {
    expect(readBack([csvField(null), csvField('x')].join(','))).toEqual(['', 'x']);
  });

  it('has a UTF-8 byte-order mark to put first', () => {
    expect(Buffer.from(UTF8_BOM, 'utf8')).toEqual(Buffer.from([0xef, 0xbb, 0xbf]));
  });
});
