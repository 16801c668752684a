/** Where a calibration result comes from: its certificate and date, each optional. */
export interface CalibrationOrigin {
  certificate?: string;
  date?: string;
}

/**
 * How a calibration correction is named in the budget, e.g.
 * 'Flask F-100-A (100 mL): calibration correction +0.03 mL (certificate WL-2291, 2026-03-02)'.
 * @example calibrationCorrectionLabel('Flask F1', -0.0125, 'mL', { certificate: 'C-7' }) // 'Flask F1: calibration correction −0.0125 mL (certificate C-7)'
 */
export function calibrationCorrectionLabel(
  name: string,
  correction: number,
  unit: string,
  origin: CalibrationOrigin,
): string {
  const sign = correction < 0 ? '−' : '+';
  const amount = Number(Math.abs(correction).toPrecision(4));
  const known = [origin.certificate ? `certificate ${origin.certificate}` : '', origin.date ?? ''].filter(
    (part) => part !== '',
  );
  const where = known.length === 0 ? '' : ` (${known.join(', ')})`;
  return `${name}: calibration correction ${sign}${amount}${unit === '' ? '' : ` ${unit}`}${where}`;
}
