/**
 * A value carrying its exact first derivatives with respect to every elementary source
 * (forward-mode automatic differentiation). Immutable; the partials are keyed by the
 * source's string id, so the same source reached along two paths is one entry and
 * its correlation is automatic: `x.subtract(x)` has no partials left.
 *
 * For y = f(x₁…x_N), `partials.get(id)` is the sensitivity coefficient cᵢ = ∂y/∂xᵢ (JCGM 100:2008 5.1.3).
 */
export class DualNumber {
  readonly value: number;
  readonly partials: ReadonlyMap<string, number>;

  private constructor(value: number, partials: ReadonlyMap<string, number>) {
    this.value = value;
    this.partials = partials;
  }

  /** A constant: no partials. */
  static constant(value: number): DualNumber {
    return new DualNumber(value, new Map());
  }

  /** An elementary source with estimate `value`: ∂x/∂x = 1. */
  static source(id: string, value: number): DualNumber {
    return new DualNumber(value, new Map([[id, 1]]));
  }

  /** Sensitivity ∂y/∂x for source `id` (0 when y does not depend on it). */
  sensitivity(id: string): number {
    return this.partials.get(id) ?? 0;
  }

  /** (a + b)' = a' + b' */
  add(other: DualNumber): DualNumber {
    return new DualNumber(this.value + other.value, combine(this.partials, 1, other.partials, 1));
  }

  /** (a − b)' = a' − b' */
  subtract(other: DualNumber): DualNumber {
    return new DualNumber(this.value - other.value, combine(this.partials, 1, other.partials, -1));
  }

  /** (a·b)' = b·a' + a·b' */
  multiply(other: DualNumber): DualNumber {
    return new DualNumber(this.value * other.value, combine(this.partials, other.value, other.partials, this.value));
  }

  /** (a/b)' = a'/b − a·b'/b² */
  divide(other: DualNumber): DualNumber {
    const quotient = this.value / other.value;
    return new DualNumber(quotient, combine(this.partials, 1 / other.value, other.partials, -quotient / other.value));
  }
}

function combine(
  left: ReadonlyMap<string, number>,
  leftScale: number,
  right: ReadonlyMap<string, number>,
  rightScale: number,
): Map<string, number> {
  const result = new Map<string, number>();
  for (const [id, partial] of left) result.set(id, partial * leftScale);
  for (const [id, partial] of right) {
    const sum = (result.get(id) ?? 0) + partial * rightScale;
    if (sum === 0) result.delete(id);
    else result.set(id, sum);
  }
  return result;
}
