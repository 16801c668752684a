import type { LabPolicy } from './library';
import type { StoredWarning } from './warnings';

/**
 * The engine's warnings as the lab's policy keeps them: with the USP <41> minimum-weight rule switched off,
 * a mass below a balance's minimum weight is not flagged. Used by the server's stored snapshot and the
 * planner's live budget alike.
 */
export function warningsUnderPolicy<W extends StoredWarning>(
  warnings: readonly W[],
  policy: Pick<LabPolicy, 'minimumWeightRule'>,
): W[] {
  return warnings.filter((warning) => policy.minimumWeightRule || warning.code !== 'belowMinimumWeight');
}
