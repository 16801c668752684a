import type { EquipmentKind } from '../../shared/contracts/library';

/**
 * The documented CSV column set of each kind (one row per item). `path` is where the value goes in
 * the item's data; `type` says how the cell is read. Empty optional cells take the schema's default.
 */
export interface CsvColumn {
  column: string;
  path: (string | number)[];
  type: 'text' | 'number' | 'date' | 'boolean' | 'optional-number' | 'optional-date' | 'optional-text';
  help: string;
}

const text = (column: string, help: string, path = [column]): CsvColumn => ({
  column,
  path: path.map(camel),
  type: 'text',
  help,
});
const num = (column: string, help: string): CsvColumn => ({ column, path: [camel(column)], type: 'number', help });
function camel(name: string | number): string | number {
  return typeof name === 'number' ? name : name.replace(/_([a-z0-9])/g, (_m, c: string) => c.toUpperCase());
}

const common: CsvColumn[] = [
  text('code', 'ID or asset tag, unique in the lab'),
  { column: 'description', path: ['description'], type: 'optional-text', help: 'free text' },
  {
    column: 'certificate_reference',
    path: ['certificateReference'],
    type: 'optional-text',
    help: 'certificate number',
  },
];
const calibration: CsvColumn[] = [
  { column: 'calibrated_on', path: ['calibratedOn'], type: 'optional-date', help: 'YYYY-MM-DD' },
  { column: 'calibration_due_on', path: ['calibrationDueOn'], type: 'optional-date', help: 'YYYY-MM-DD' },
];
const optionalNumber = (column: string, help: string, path = [camel(column)]): CsvColumn => ({
  column,
  path,
  type: 'optional-number',
  help,
});
const glassware: CsvColumn[] = [
  ...common,
  num('nominal_ml', 'nominal volume, mL'),
  { column: 'glass_class', path: ['glassClass'], type: 'text', help: 'A, B or own' },
  num('tolerance_ml', '± tolerance, mL'),
  {
    column: 'tolerance_distribution',
    path: ['toleranceDistribution'],
    type: 'optional-text',
    help: 'triangular, rectangular, or empty for the lab policy',
  },
  num('fill_repeatability_ml', 'standard deviation of filling, mL'),
  {
    column: 'calibration_temperature_c',
    path: ['calibrationTemperatureC'],
    type: 'optional-number',
    help: '°C, default 20',
  },
  optionalNumber(
    'calibration_correction_ml',
    'calibration correction at the nominal volume, mL; empty: the tolerance applies',
  ),
  optionalNumber('calibration_expanded_uncertainty_ml', 'U of that correction, mL'),
  optionalNumber('calibration_coverage_factor', 'k of that U'),
  ...calibration,
];
const material: CsvColumn[] = [
  ...common,
  text('name', 'material name'),
  text('lot', 'lot number'),
  { column: 'supplier', path: ['supplier'], type: 'optional-text', help: 'free text' },
  { column: 'expires_on', path: ['expiresOn'], type: 'date', help: 'YYYY-MM-DD' },
  { column: 'hazard_notes', path: ['hazardNotes'], type: 'optional-text', help: 'shown wherever the material is used' },
];

export const CSV_COLUMNS: Record<EquipmentKind, CsvColumn[]> = {
  balance: [
    ...common,
    num('capacity_g', 'maximum load, g'),
    num('readability_g', 'scale interval d, g'),
    num('repeatability_g', 'standard deviation s from the lab’s check, g'),
    {
      column: 'repeatability_readings',
      path: ['repeatabilityReadings'],
      type: 'optional-number',
      help: 'number of readings s comes from (Type A, ν = n − 1); empty if not known',
    },
    num('linearity_g', '± linearity from the certificate, g'),
    num('sensitivity_relative_expanded', 'relative expanded calibration uncertainty, e.g. 0.00002'),
    num('sensitivity_coverage_factor', 'k of that uncertainty'),
    optionalNumber(
      'calibration_correction_relative',
      'relative correction of the indication from the certificate, e.g. 0.00001',
    ),
    ...calibration,
  ],
  flask: glassware,
  'glass-pipette': glassware,
  'piston-pipette': [
    ...common,
    { column: 'adjustable', path: ['adjustable'], type: 'boolean', help: 'yes or no' },
    num('min_volume_ul', 'smallest volume, µL'),
    num('max_volume_ul', 'nominal volume, µL'),
    { column: 'error_basis', path: ['errorBasis'], type: 'text', help: 'iso-8655 or own' },
    ...[1, 2, 3].flatMap((n): CsvColumn[] => [
      {
        column: `volume_ul_${n}`,
        path: ['points', n - 1, 'volumeUl'],
        type: n === 1 ? 'number' : 'optional-number',
        help: `set volume ${n}, µL`,
      },
      {
        column: `systematic_error_ul_${n}`,
        path: ['points', n - 1, 'systematicErrorUl'],
        type: n === 1 ? 'number' : 'optional-number',
        help: `± systematic error at volume ${n}, µL`,
      },
      {
        column: `random_error_ul_${n}`,
        path: ['points', n - 1, 'randomErrorUl'],
        type: n === 1 ? 'number' : 'optional-number',
        help: `random error (standard deviation) at volume ${n}, µL`,
      },
      optionalNumber(`correction_ul_${n}`, `calibration correction at volume ${n}, µL`, [
        'points',
        n - 1,
        'correctionUl',
      ]),
      optionalNumber(`correction_expanded_ul_${n}`, `U of that correction, µL`, [
        'points',
        n - 1,
        'correctionExpandedUl',
      ]),
    ]),
    optionalNumber('calibration_coverage_factor', 'k of the corrections’ U'),
    ...calibration,
  ],
  'solid-material': [
    ...material,
    text('formula', 'e.g. Pb(NO3)2'),
    text('analyte', 'element or ion reported, e.g. Pb'),
    num('purity', 'mass fraction, e.g. 0.9998'),
    {
      column: 'purity_uncertainty_shape',
      path: ['purityUncertainty', 'shape'],
      type: 'text',
      help: 'normal or rectangular',
    },
    {
      column: 'purity_expanded_uncertainty',
      path: ['purityUncertainty', 'expandedUncertainty'],
      type: 'optional-number',
      help: 'U, for normal',
    },
    {
      column: 'purity_coverage_factor',
      path: ['purityUncertainty', 'coverageFactor'],
      type: 'optional-number',
      help: 'k, for normal',
    },
    {
      column: 'purity_half_width',
      path: ['purityUncertainty', 'halfWidth'],
      type: 'optional-number',
      help: '± half-width, for rectangular',
    },
    {
      column: 'density_g_per_cm3',
      path: ['densityGPerCm3'],
      type: 'optional-number',
      help: 'g/cm³ (safety data sheet), for air buoyancy',
    },
    ...[
      ['certificate_molar_mass_g_per_mol', 'molar mass from the certificate, g/mol (checked against the formula)'],
      ['certificate_molar_mass_expanded_uncertainty_g_per_mol', 'its U, g/mol (then used in the budget)'],
      ['certificate_molar_mass_coverage_factor', 'k of that U (1 for a standard uncertainty)'],
      ['analyte_atomic_weight_g_per_mol', 'the lot’s atomic weight of the analyte, g/mol'],
      ['analyte_atomic_weight_expanded_uncertainty_g_per_mol', 'its U, g/mol'],
      ['analyte_atomic_weight_coverage_factor', 'k of that U (1 for a standard uncertainty)'],
    ].map(([column, help]): CsvColumn => ({ column, path: [camel(column)], type: 'optional-number', help })),
    {
      column: 'composition_source',
      path: ['compositionSource'],
      type: 'optional-text',
      help: 'where the molar mass or atomic weight comes from',
    },
  ],
  'solution-material': [
    ...material,
    text('analyte', 'e.g. Se'),
    num('certified_value', 'certified concentration or mass fraction'),
    { column: 'certified_unit', path: ['certifiedUnit'], type: 'text', help: 'mg/L or mg/kg' },
    num('expanded_uncertainty', 'U of the certified value, same unit'),
    num('coverage_factor', 'k'),
    { column: 'matrix', path: ['matrix'], type: 'optional-text', help: 'e.g. 2 % HNO3' },
    { column: 'density_g_per_ml', path: ['densityGPerMl'], type: 'optional-number', help: 'g/mL, if certified' },
    {
      column: 'density_uncertainty_g_per_ml',
      path: ['densityUncertaintyGPerMl'],
      type: 'optional-number',
      help: 'standard uncertainty, g/mL',
    },
    { column: 'opened_on', path: ['openedOn'], type: 'optional-date', help: 'YYYY-MM-DD' },
  ],
};
