/**
 * Slack added before truncation, so that a Welch–Satterthwaite sum whose exact value is a whole number but which
 * rounding leaves a few ulps below it (a single Type A source with n = 5 can give 3.9999999999999996) is read
 * at that whole number. Far below any real fractional part of ν_eff, far above double-precision rounding.
 */
const ROUNDING_SLACK = 1e-9;

/**
 * The degrees of freedom the coverage factor is read at: ⌊ν_eff + 10⁻⁹⌋ (the next lower integer, with a slack
 * for rounding), and at least 1; ∞ stays ∞. JCGM 100:2008 (GUM), G.4.1 Note 1 and G.6.4: where ν_eff is not an
 * integer, take t_p at ν_eff truncated to the next lower integer.
 * @example truncateDegreesOfFreedom(8.7) // 8
 * @example truncateDegreesOfFreedom(3.9999999999999996) // 4
 * @example truncateDegreesOfFreedom(Infinity) // Infinity
 */
export function truncateDegreesOfFreedom(degrees: number): number {
  return degrees === Infinity ? Infinity : Math.max(1, Math.floor(degrees + ROUNDING_SLACK));
}

/**
 * ν_eff as every report prints it (screens, PDF, mail): the whole number the coverage factor was read
 * at (see truncateDegreesOfFreedom), or "∞".
 * @example formatDegreesOfFreedom(8.7) // '8'
 * @example formatDegreesOfFreedom(Infinity) // '∞'
 */
export function formatDegreesOfFreedom(degrees: number): string {
  const truncated = truncateDegreesOfFreedom(degrees);
  return Number.isFinite(truncated) ? String(truncated) : '∞';
}
