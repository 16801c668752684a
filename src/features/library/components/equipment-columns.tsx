import {
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  columnFilteringFeature,
  filterFn_includesString,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  tableFeatures,
} from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { EquipmentItem, EquipmentKind } from '../../../../shared/contracts/library';
import { molarMassFigures, molarMassOf } from '../../../../shared/contracts/material-composition-text';
import { paths } from '../../../config/paths';
import { formatFormula } from '../utils/format-formula';
import { formatQuantity } from '../utils/format-quantity';
import { HazardMarker } from './hazard-marker';
import { ItemStatusBadges } from './item-status-badges';

export const equipmentTableFeatures = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  filteredRowModel: createFilteredRowModel(),
  sortedRowModel: createSortedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic },
  filterFns: { includesString: filterFn_includesString },
});
const column = createColumnHelper<typeof equipmentTableFeatures, EquipmentItem>();

/** Column ids whose cells hold numbers: right-aligned, in tabular figures. */
export const NUMERIC_COLUMN_IDS = new Set([
  'capacityG',
  'readabilityG',
  'repeatabilityG',
  'minimumWeightG',
  'nominalMl',
  'toleranceMl',
  'fillRepeatabilityMl',
  'pointVolumeUl',
  'systematicErrorUl',
  'randomErrorUl',
  'purity',
  'molarMass',
  'certifiedValue',
  'expandedUncertainty',
  'certificateCount',
]);
/** Column ids the search box looks in. */
export const SEARCHED_COLUMN_IDS = new Set(['code', 'description']);

const field = (item: EquipmentItem, key: string) => item.current.data[key];
const numberOf = (item: EquipmentItem, key: string) => {
  const value = field(item, key);
  return typeof value === 'number' ? value : undefined;
};
const textOf = (item: EquipmentItem, key: string) => {
  const value = field(item, key);
  return typeof value === 'string' && value !== '' ? value : undefined;
};
const shownNumber = (value: number | undefined | null) =>
  value === undefined || value === null ? '—' : formatQuantity(value);
const firstPoint = (item: EquipmentItem) =>
  (field(item, 'points') as { volumeUl: number; systematicErrorUl: number; randomErrorUl: number }[] | undefined)?.[0];

/** A heading whose unit never breaks from itself: "Tolerance" over "(± mL)" when the column is narrow. */
const withUnit = (label: string, unit: string) => () => (
  <>
    {label} <span className="whitespace-nowrap">({unit})</span>
  </>
);

const numeric = (id: string, header: string | (() => ReactNode), read: (item: EquipmentItem) => number | undefined) =>
  column.accessor(read, {
    id,
    header,
    sortFn: 'basic',
    sortUndefined: 'last',
    cell: (info) => shownNumber(info.getValue()),
  });

const codeColumn = column.accessor('code', {
  id: 'code',
  header: 'ID',
  sortFn: 'alphanumeric',
  cell: (info) => (
    <Link to={paths.app.libraryItem.href(info.row.original.id)} className="font-semibold whitespace-nowrap">
      {info.getValue()}
    </Link>
  ),
});
const descriptionColumn = column.accessor((item) => textOf(item, 'description') ?? '', {
  id: 'description',
  header: 'Description',
  enableSorting: false,
  cell: (info) => <span className="text-sm">{info.getValue() || '—'}</span>,
});
/** Materials: the name, with the description under it; the search reads both. */
const materialNameColumn = column.accessor(
  (item) => [textOf(item, 'name'), textOf(item, 'description')].filter(Boolean).join(' — '),
  {
    id: 'description',
    header: 'Name',
    sortFn: 'alphanumeric',
    cell: (info) => (
      <div>
        <div>{textOf(info.row.original, 'name')}</div>
        {textOf(info.row.original, 'description') ? (
          <div className="text-sm text-muted">{textOf(info.row.original, 'description')}</div>
        ) : null}
      </div>
    ),
  },
);
const dateColumn = (key: string, header: string) =>
  column.accessor((item) => textOf(item, key), {
    id: key,
    header,
    sortFn: 'alphanumeric',
    sortUndefined: 'last',
    cell: (info) => <span className="whitespace-nowrap">{info.getValue() ?? '—'}</span>,
  });
const hazardColumn = column.accessor((item) => textOf(item, 'hazardNotes'), {
  id: 'hazard',
  header: 'Hazard',
  enableSorting: false,
  cell: (info) => {
    const notes = info.getValue();
    return notes ? <HazardMarker notes={notes} /> : <span className="text-muted">none noted</span>;
  },
});
const lotColumn = column.accessor((item) => textOf(item, 'lot'), {
  id: 'lot',
  header: 'Lot',
  sortFn: 'alphanumeric',
  cell: (info) => <span className="whitespace-nowrap">{info.getValue() ?? '—'}</span>,
});
const statusColumn = column.display({
  id: 'status',
  header: 'Status',
  cell: (info) => <ItemStatusBadges item={info.row.original} />,
});
const certificatesColumn = numeric('certificateCount', 'Certificates', (item) => item.certificateCount);
const calibrationDueColumn = dateColumn('calibrationDueOn', 'Calibration due');

const glasswareColumns = [
  codeColumn,
  descriptionColumn,
  column.accessor((item) => textOf(item, 'glassClass'), {
    id: 'glassClass',
    header: 'Class',
    sortFn: 'alphanumeric',
    cell: (info) => (info.getValue() === 'own' ? 'own' : info.getValue()),
  }),
  numeric('nominalMl', withUnit('Nominal', 'mL'), (item) => numberOf(item, 'nominalMl')),
  numeric('toleranceMl', withUnit('Tolerance', '± mL'), (item) => numberOf(item, 'toleranceMl')),
  numeric('fillRepeatabilityMl', withUnit('Fill repeatability s', 'mL'), (item) =>
    numberOf(item, 'fillRepeatabilityMl'),
  ),
  calibrationDueColumn,
  certificatesColumn,
  statusColumn,
];

/** The columns each kind's table shows; units sit in the headers, so cells hold bare numbers. */
export const EQUIPMENT_COLUMNS: Record<EquipmentKind, ReturnType<typeof column.columns>> = {
  balance: column.columns([
    codeColumn,
    descriptionColumn,
    numeric('capacityG', withUnit('Capacity', 'g'), (item) => numberOf(item, 'capacityG')),
    numeric('readabilityG', withUnit('Readability d', 'g'), (item) => numberOf(item, 'readabilityG')),
    numeric('repeatabilityG', withUnit('Repeatability s', 'g'), (item) => numberOf(item, 'repeatabilityG')),
    numeric('minimumWeightG', withUnit('Minimum weight', 'g'), (item) => item.minimumWeightG ?? undefined),
    calibrationDueColumn,
    certificatesColumn,
    statusColumn,
  ]),
  flask: column.columns(glasswareColumns),
  'glass-pipette': column.columns(glasswareColumns),
  'piston-pipette': column.columns([
    codeColumn,
    descriptionColumn,
    column.accessor((item) => numberOf(item, 'maxVolumeUl'), {
      id: 'range',
      header: withUnit('Range', 'µL'),
      sortFn: 'basic',
      cell: (info) => {
        const min = numberOf(info.row.original, 'minVolumeUl');
        const max = info.getValue();
        return (
          <span className="whitespace-nowrap">
            {min === max ? shownNumber(max) : `${shownNumber(min)}–${shownNumber(max)}`}
          </span>
        );
      },
    }),
    numeric('pointVolumeUl', withUnit('Errors at', 'µL'), (item) => firstPoint(item)?.volumeUl),
    numeric('systematicErrorUl', withUnit('Systematic', '± µL'), (item) => firstPoint(item)?.systematicErrorUl),
    numeric('randomErrorUl', withUnit('Random s', 'µL'), (item) => firstPoint(item)?.randomErrorUl),
    calibrationDueColumn,
    certificatesColumn,
    statusColumn,
  ]),
  'solid-material': column.columns([
    codeColumn,
    materialNameColumn,
    column.accessor((item) => textOf(item, 'formula'), {
      id: 'formula',
      header: 'Formula',
      enableSorting: false,
      cell: (info) => formatFormula(info.getValue() ?? '—'),
    }),
    lotColumn,
    column.accessor((item) => molarMassOf(item.current.data), {
      id: 'molarMass',
      header: withUnit('Molar mass', 'g/mol'),
      sortFn: 'basic',
      sortUndefined: 'last',
      cell: (info) => {
        const value = info.getValue();
        return value === undefined ? '—' : molarMassFigures(value);
      },
    }),
    numeric('purity', withUnit('Purity', 'g/g'), (item) => numberOf(item, 'purity')),
    dateColumn('expiresOn', 'Expires'),
    hazardColumn,
    certificatesColumn,
    statusColumn,
  ]),
  'solution-material': column.columns([
    codeColumn,
    materialNameColumn,
    lotColumn,
    column.accessor((item) => numberOf(item, 'certifiedValue'), {
      id: 'certifiedValue',
      header: 'Certified value',
      sortFn: 'basic',
      cell: (info) => (
        <span className="whitespace-nowrap">{`${shownNumber(info.getValue())} ${textOf(info.row.original, 'certifiedUnit') ?? ''}`}</span>
      ),
    }),
    column.accessor((item) => numberOf(item, 'expandedUncertainty'), {
      id: 'expandedUncertainty',
      header: 'U (same unit)',
      sortFn: 'basic',
      cell: (info) =>
        `${shownNumber(info.getValue())} (k = ${shownNumber(numberOf(info.row.original, 'coverageFactor'))})`,
    }),
    dateColumn('expiresOn', 'Expires'),
    hazardColumn,
    certificatesColumn,
    statusColumn,
  ]),
};
