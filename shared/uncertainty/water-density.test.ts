import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { minimumWeightG } from './minimum-weight';
import { PlanError } from './plan-error';
import { unitOf } from './units';
import { waterDensityKgPerM3 } from './water-density';

const tanaka = JSON.parse(
  readFileSync(new URL('../../tests/fixtures/engine/tanaka-2001-water-density.json', import.meta.url), 'utf8'),
) as {
  cases: { temperatureC: number; densityKgPerM3: number }[];
};

describe('water density (Tanaka et al. 2001)', () => {
  // Table values of Tanaka et al., Metrologia 38 (2001) 301, to 4 decimals (from memory; 15/20/25 °C also computed from the paper's fitted formula).
  // Tolerance 0.00015 kg/m³: rounding of the 4th decimal plus the formula's fit to its own table.
  it('reads the six table values (so the checks below are not vacuous)', () => {
    expect(tanaka.cases).toHaveLength(6);
  });
  it.each(tanaka.cases)('ρ($temperatureC °C) = $densityKgPerM3 kg/m³', ({ temperatureC, densityKgPerM3 }) => {
    expect(Math.abs(waterDensityKgPerM3(temperatureC) - densityKgPerM3)).toBeLessThanOrEqual(0.00015);
  });
  it('refuses temperatures outside 0–40 °C', () => {
    expect(() => waterDensityKgPerM3(55)).toThrow(PlanError);
  });
});

describe('USP <41> minimum weight', () => {
  // USP <41>: 2·s/m ≤ 0.10 % → m_min = 2000·s; example s = 0.00015 g → 0.30000 g (USP <41> Weights and Balances, read).
  it('s = 0.00015 g gives 0.3 g', () => {
    expect(minimumWeightG(0.00015, 0.0001)).toBeCloseTo(0.3, 12);
  });
  // When s < 0.41·d, 0.41·d replaces s: d = 0.1 mg, s = 0.02 mg → m_min = 2000·0.041 mg = 82 mg.
  it('uses 0.41·d when the repeatability is smaller', () => {
    expect(minimumWeightG(0.00002, 0.0001)).toBeCloseTo(0.082, 12);
  });
});

describe('units', () => {
  it('accepts the Greek mu as the micro sign and refuses unknown units', () => {
    expect(unitOf('\u03bcg/L', ['settings', 'outputUnit']).name).toBe('µg/L');
    expect(() => unitOf('ug/L', ['settings', 'outputUnit'])).toThrow(/Did you mean "µg\/L"/);
    expect(() => unitOf('ppm', ['settings', 'outputUnit'])).toThrow(PlanError);
  });
});
