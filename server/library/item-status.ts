import type { EquipmentKind } from '../../shared/contracts/library';

/** Days of warning before a calibration falls due or a material expires (common practice: one month). */
export const WARNING_DAYS = 30;

const addDays = (isoDate: string, days: number) =>
  new Date(Date.parse(`${isoDate}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

export type CalibrationState = 'ok' | 'due-soon' | 'overdue' | 'not-tracked';
export type ExpiryState = 'ok' | 'expires-soon' | 'expired' | 'not-applicable';

export const isMaterial = (kind: EquipmentKind) => kind === 'solid-material' || kind === 'solution-material';

/** Calibration state on `today` (YYYY-MM-DD) from the due date; items without one are not tracked. */
export function calibrationState(dueOn: string | null | undefined, today: string): CalibrationState {
  if (!dueOn) return 'not-tracked';
  if (dueOn < today) return 'overdue';
  if (dueOn <= addDays(today, WARNING_DAYS)) return 'due-soon';
  return 'ok';
}

/** Expiry state of a reference material on `today`; an item expires at the end of its expiry day. */
export function expiryState(expiresOn: string | null | undefined, today: string): ExpiryState {
  if (!expiresOn) return 'not-applicable';
  if (expiresOn < today) return 'expired';
  if (expiresOn <= addDays(today, WARNING_DAYS)) return 'expires-soon';
  return 'ok';
}

/** Plain words for the states worth a chemist's attention. */
export function flagWords(input: {
  retiredReason: string | null;
  calibration: CalibrationState;
  dueOn: string | null | undefined;
  expiry: ExpiryState;
  expiresOn: string | null | undefined;
}): string[] {
  const words: string[] = [];
  if (input.retiredReason !== null) words.push(`Retired: ${input.retiredReason}`);
  if (input.calibration === 'overdue') words.push(`Calibration overdue since ${input.dueOn}`);
  if (input.calibration === 'due-soon') words.push(`Calibration due on ${input.dueOn}`);
  if (input.expiry === 'expired') words.push(`Expired on ${input.expiresOn}`);
  if (input.expiry === 'expires-soon') words.push(`Expires on ${input.expiresOn}`);
  return words;
}
