/**
 * The degrees of freedom the coverage factor is read at: ν_eff truncated to the next lower integer,
 * and at least 1; ∞ stays ∞. JCGM 100:2008 (GUM), G.4.1 Note 1 and G.6.4: where ν_eff is not an
 * integer, take t_p at ν_eff truncated to the next lower integer.
 * @example truncateDegreesOfFreedom(8.7) // 8
 * @example truncateDegreesOfFreedom(Infinity) // Infinity
 */
export function truncateDegreesOfFreedom(degrees: number): number {
  return degrees === Infinity ? Infinity : Math.max(1, Math.floor(degrees));
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
