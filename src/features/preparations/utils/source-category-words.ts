import type { SourceCategory } from '../../../../shared/uncertainty';

/** Each source type in the words a chemist uses. */
export const SOURCE_CATEGORY_WORDS: Record<SourceCategory, string> = {
  balanceRepeatability: 'Balance repeatability',
  balanceReadability: 'Balance readability',
  balanceLinearity: 'Balance linearity',
  balanceSensitivity: 'Balance calibration',
  volumetricTolerance: 'Glassware tolerance',
  fillRepeatability: 'Filling to the mark',
  pipetteSystematicError: 'Piston pipette systematic error',
  pipetteRandomError: 'Piston pipette random error',
  temperature: 'Temperature',
  purity: 'Purity',
  certifiedValue: 'Certified value',
  atomicWeight: 'Atomic weights',
  density: 'Density',
  userDefined: 'Extra sources',
  calibrationCorrection: 'Calibration corrections',
  airBuoyancy: 'Air buoyancy',
};

export const categoryWords = (key: string) => SOURCE_CATEGORY_WORDS[key as SourceCategory] ?? key;
