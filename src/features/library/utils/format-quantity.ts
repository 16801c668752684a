const quantityFormat = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 15, useGrouping: false });

/** A stored number as a chemist wrote it: no exponent, no thousands separator (0.000015, 1000). */
export function formatQuantity(value: number): string {
  return quantityFormat.format(value).replace('-', '−');
}
