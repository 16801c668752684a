/**
 * Minimum net weight of a balance by USP <41> (repeatability): 2·s/m ≤ 0.10 %, so
 * m_min = 2000·s, with s replaced by 0.41·d when it is smaller (d = readability).
 * @example minimumWeightG(0.00015, 0.0001) // 0.3
 */
export function minimumWeightG(repeatabilityG: number, readabilityG: number): number {
  return 2000 * Math.max(repeatabilityG, 0.41 * readabilityG);
}
