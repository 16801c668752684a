import type { EquipmentKind } from '../../../../shared/contracts/library';
import { compositionSummaryOf } from '../../../../shared/contracts/material-composition-text';
import { formatFormula } from './format-formula';
import { formatQuantity } from './format-quantity';

type Data = Record<string, unknown>;

/** One stored field of an item: its label, its unit, and how its value reads. */
export type EquipmentField = {
  key: string;
  label: string;
  unit?: string | ((data: Data) => string);
  format?: (value: unknown) => string;
  /** Shown when the value is empty (default "—"). */
  emptyText?: string;
  /** For a value computed from the data rather than stored under `key`. */
  read?: (data: Data) => unknown;
};

const yesNo = (value: unknown) => (value ? 'Yes' : 'No');
const CLASS_WORDS: Record<string, string> = { A: 'Class A', B: 'Class B', own: 'Own calibration' };
const BASIS_WORDS: Record<string, string> = { 'iso-8655': 'ISO 8655-2 limits', own: 'Own calibration' };
const number = (value: unknown) => (typeof value === 'number' ? formatQuantity(value) : String(value));
/** Small masses also in mg, as balance certificates state them: "0.00001 g (0.01 mg)". */
const gramsAndMilligrams = (value: unknown) =>
  typeof value === 'number' && value < 0.1
    ? `${formatQuantity(value)} g (${formatQuantity(Number((value * 1000).toPrecision(6)))} mg)`
    : `${number(value)} g`;

type PistonPoint = {
  volumeUl: number;
  systematicErrorUl: number;
  randomErrorUl: number;
  correctionUl?: number | null;
  correctionExpandedUl?: number | null;
};
const formatPoints = (value: unknown) =>
  (value as PistonPoint[])
    .map(
      (point) =>
        `at ${number(point.volumeUl)} µL: ± ${number(point.systematicErrorUl)} µL systematic, ${number(point.randomErrorUl)} µL random (s)` +
        (point.correctionUl == null
          ? ''
          : `, calibration correction ${number(point.correctionUl)} µL (U ${number(point.correctionExpandedUl)} µL)`),
    )
    .join('; ');

type PurityUncertainty =
  | { shape: 'normal'; expandedUncertainty: number; coverageFactor: number }
  | { shape: 'rectangular'; halfWidth: number };
const formatPurityUncertainty = (value: unknown) => {
  const uncertainty = value as PurityUncertainty;
  return uncertainty.shape === 'normal'
    ? `U = ${number(uncertainty.expandedUncertainty)} (k = ${number(uncertainty.coverageFactor)}), normal`
    : `± ${number(uncertainty.halfWidth)}, rectangular`;
};

const COMMON: EquipmentField[] = [
  { key: 'code', label: 'ID' },
  { key: 'description', label: 'Description' },
  { key: 'certificateReference', label: 'Certificate reference' },
];
const CALIBRATION: EquipmentField[] = [
  { key: 'calibratedOn', label: 'Calibrated on' },
  { key: 'calibrationDueOn', label: 'Calibration due on' },
];
const GLASSWARE: EquipmentField[] = [
  ...COMMON,
  { key: 'glassClass', label: 'Class', format: (value) => CLASS_WORDS[String(value)] ?? String(value) },
  { key: 'nominalMl', label: 'Nominal volume', unit: 'mL' },
  { key: 'toleranceMl', label: 'Tolerance (±)', unit: 'mL' },
  { key: 'toleranceDistribution', label: 'Tolerance distribution', emptyText: 'as the lab policy says' },
  { key: 'fillRepeatabilityMl', label: 'Fill repeatability s', unit: 'mL' },
  { key: 'calibrationTemperatureC', label: 'Calibration temperature', unit: '°C' },
  {
    key: 'calibrationCorrectionMl',
    label: 'Calibration correction',
    unit: 'mL',
    emptyText: 'none: the tolerance applies',
  },
  { key: 'calibrationExpandedUncertaintyMl', label: 'Calibration correction U', unit: 'mL', emptyText: '—' },
  { key: 'calibrationCoverageFactor', label: 'Coverage factor k of that U', emptyText: '—' },
  ...CALIBRATION,
];
const MATERIAL: EquipmentField[] = [
  { key: 'code', label: 'ID' },
  { key: 'name', label: 'Name' },
  { key: 'description', label: 'Description' },
  { key: 'lot', label: 'Lot' },
  { key: 'supplier', label: 'Supplier' },
  { key: 'certificateReference', label: 'Certificate reference' },
  { key: 'expiresOn', label: 'Expires on' },
];
const certifiedUnit = (data: Data) => String(data.certifiedUnit ?? '');

/** The fields of each kind, in the order the item page lists them. */
export const EQUIPMENT_FIELDS: Record<EquipmentKind, EquipmentField[]> = {
  balance: [
    ...COMMON,
    { key: 'capacityG', label: 'Capacity', unit: 'g' },
    { key: 'readabilityG', label: 'Readability d', format: gramsAndMilligrams },
    { key: 'repeatabilityG', label: 'Repeatability s', format: gramsAndMilligrams },
    { key: 'repeatabilityReadings', label: 'Readings behind s', emptyText: 'Not given (s taken as exact)' },
    { key: 'linearityG', label: 'Linearity (±)', format: gramsAndMilligrams },
    {
      key: 'sensitivityRelativeExpanded',
      label: 'Calibration uncertainty U, relative',
      format: (value) => `${number(value)} (${number(Number(value) * 1e6)} ppm)`,
    },
    { key: 'sensitivityCoverageFactor', label: 'Coverage factor k of U' },
    {
      key: 'calibrationCorrectionRelative',
      label: 'Calibration correction of the indication, relative',
      emptyText: 'none',
    },
    ...CALIBRATION,
  ],
  flask: GLASSWARE,
  'glass-pipette': GLASSWARE,
  'piston-pipette': [
    ...COMMON,
    { key: 'adjustable', label: 'Adjustable volume', format: yesNo },
    { key: 'minVolumeUl', label: 'Smallest volume', unit: 'µL' },
    { key: 'maxVolumeUl', label: 'Nominal (largest) volume', unit: 'µL' },
    { key: 'errorBasis', label: 'Error basis', format: (value) => BASIS_WORDS[String(value)] ?? String(value) },
    { key: 'points', label: 'Calibration points', format: formatPoints },
    { key: 'calibrationCoverageFactor', label: 'Coverage factor k of the corrections’ U', emptyText: '—' },
    ...CALIBRATION,
  ],
  'solid-material': [
    ...MATERIAL,
    { key: 'formula', label: 'Formula', format: (value) => formatFormula(String(value)) },
    { key: 'analyte', label: 'Analyte' },
    { key: 'purity', label: 'Purity (mass fraction)' },
    { key: 'purityUncertainty', label: 'Purity uncertainty', format: formatPurityUncertainty },
    {
      key: 'composition',
      label: 'Molar mass and analyte',
      read: (data) => {
        const summary = compositionSummaryOf(data);
        return summary === null ? null : 'text' in summary ? summary.text : summary.problem;
      },
      format: String,
    },
    { key: 'certificateMolarMassGPerMol', label: 'Molar mass from the certificate', unit: 'g/mol' },
    {
      key: 'certificateMolarMassExpandedUncertaintyGPerMol',
      label: 'Molar mass: expanded uncertainty U',
      unit: (data) => `g/mol (k = ${number(data.certificateMolarMassCoverageFactor)})`,
    },
    { key: 'analyteAtomicWeightGPerMol', label: 'Atomic weight of the analyte, this lot', unit: 'g/mol' },
    {
      key: 'analyteAtomicWeightExpandedUncertaintyGPerMol',
      label: 'Atomic weight: expanded uncertainty U',
      unit: (data) => `g/mol (k = ${number(data.analyteAtomicWeightCoverageFactor)})`,
    },
    { key: 'compositionSource', label: 'Source of these values' },
  ],
  'solution-material': [
    ...MATERIAL,
    { key: 'analyte', label: 'Analyte' },
    { key: 'certifiedValue', label: 'Certified value', unit: certifiedUnit },
    { key: 'expandedUncertainty', label: 'Expanded uncertainty U', unit: certifiedUnit },
    { key: 'coverageFactor', label: 'Coverage factor k' },
    { key: 'matrix', label: 'Matrix' },
    { key: 'densityGPerMl', label: 'Density', unit: 'g/mL' },
    { key: 'densityUncertaintyGPerMl', label: 'Density standard uncertainty', unit: 'g/mL' },
    { key: 'openedOn', label: 'Opened on' },
  ],
};

/** The value of one field as text with its unit; "—" when it is empty. */
export function formatFieldValue(field: EquipmentField, data: Data): string {
  const value = field.read ? field.read(data) : data[field.key];
  if (value === null || value === undefined || value === '') return field.emptyText ?? '—';
  const text = field.format ? field.format(value) : typeof value === 'boolean' ? yesNo(value) : number(value);
  const unit = typeof field.unit === 'function' ? field.unit(data) : field.unit;
  return unit ? `${text} ${unit}` : text;
}
