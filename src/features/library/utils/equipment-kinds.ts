import { EQUIPMENT_KINDS, type EquipmentKind } from '../../../../shared/contracts/library';

/** The library's tabs, in the order a lab walks its bench: balances, glassware, pipettes, materials. */
export const KIND_TABS: readonly { kind: EquipmentKind; label: string; singular: string }[] = [
  { kind: 'balance', label: 'Balances', singular: 'balance' },
  { kind: 'flask', label: 'Flasks', singular: 'volumetric flask' },
  { kind: 'glass-pipette', label: 'Glass pipettes', singular: 'glass pipette' },
  { kind: 'piston-pipette', label: 'Piston pipettes', singular: 'piston pipette' },
  { kind: 'solid-material', label: 'Solid materials', singular: 'solid reference material' },
  { kind: 'solution-material', label: 'Certified solutions', singular: 'certified solution' },
];

/** The kind named in an address, or the first tab when it names none or no known kind. */
export function kindFromSearch(value: string | null): EquipmentKind {
  return EQUIPMENT_KINDS.find((kind) => kind === value) ?? 'balance';
}

export const singularOf = (kind: EquipmentKind) => KIND_TABS.find((tab) => tab.kind === kind)?.singular ?? kind;
