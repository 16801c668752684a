import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DualNumber } from './dual-number';

describe('dual numbers', () => {
  it('x − x has no partials (independent sources know only themselves)', () => {
    const x = DualNumber.source('x', 3);
    expect(x.subtract(x).partials.size).toBe(0);
    expect(x.divide(x).sensitivity('x')).toBe(0);
  });

  it('is immutable: operations leave their operands unchanged', () => {
    const x = DualNumber.source('x', 2);
    x.multiply(DualNumber.constant(5));
    expect(x.sensitivity('x')).toBe(1);
    expect(x.value).toBe(2);
  });

  // Analytic derivatives against central differences f'(x) ≈ (f(x+h) − f(x−h))/2h, h = 1e-6·|x|;
  // truncation error O(h²)·f''' and rounding error ~ε·f/h, so a relative tolerance of 1e-6 is safe.
  it('matches central differences for y = a·b/(c − d) + a/b on random inputs', () => {
    const formula = (a: number, b: number, c: number, d: number) => (a * b) / (c - d) + a / b;
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        fc.double({ min: 60, max: 100, noNaN: true }),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        (a, b, c, d) => {
          const [da, db, dc, dd] = [
            DualNumber.source('a', a),
            DualNumber.source('b', b),
            DualNumber.source('c', c),
            DualNumber.source('d', d),
          ];
          const y = da.multiply(db).divide(dc.subtract(dd)).add(da.divide(db));
          const inputs = { a, b, c, d };
          for (const name of ['a', 'b', 'c', 'd'] as const) {
            const h = 1e-6 * Math.abs(inputs[name]);
            const plus = { ...inputs, [name]: inputs[name] + h };
            const minus = { ...inputs, [name]: inputs[name] - h };
            const central =
              (formula(plus.a, plus.b, plus.c, plus.d) - formula(minus.a, minus.b, minus.c, minus.d)) / (2 * h);
            expect(Math.abs(y.sensitivity(name) - central)).toBeLessThanOrEqual(1e-6 * Math.max(1, Math.abs(central)));
          }
        },
      ),
    );
  });
});
