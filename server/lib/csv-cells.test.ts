import { describe, expect, it } from 'vitest';
import { neutraliseCell, restoreCell, toSafeCsv } from './csv-cells';

// OWASP Foundation, "CSV Injection" (web page, from memory): cells starting with = + - @, tab (0x09) or carriage return (0x0D) are prefixed.
describe('neutraliseCell', () => {
  it('prefixes every formula start with an apostrophe', () => {
    expect(['=1+1', '+1+1', '-2+3', '@SUM(A1)', '\t=1', '\r=1'].map(neutraliseCell)).toEqual([
      "'=1+1",
      "'+1+1",
      "'-2+3",
      "'@SUM(A1)",
      "'\t=1",
      "'\r=1",
    ]);
  });
  it('leaves plain numbers, ordinary text and empty cells alone', () => {
    expect([-0.5, '+1e-3', '-12', 'Pb 1000 mg/L', '', null, 42].map(neutraliseCell)).toEqual([
      '-0.5',
      '+1e-3',
      '-12',
      'Pb 1000 mg/L',
      '',
      '',
      '42',
    ]);
  });
  it('round-trips through restoreCell', () => {
    for (const cell of ['=1+1', '-2+3', '@x', "'quoted already", 'plain', '-0.5'])
      expect(restoreCell(neutraliseCell(cell))).toBe(cell);
  });
  it('writes a CSV whose cells are neutralised and quoted', () => {
    expect(toSafeCsv([['a', '=b,c']])).toBe(`a,"'=b,c"\n`);
  });
});
