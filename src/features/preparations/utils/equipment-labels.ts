import type { EquipmentItem } from '../../../../shared/contracts/library';
import { molarMassOf, molarMassText } from '../../../../shared/contracts/material-composition-text';

const data = (item: EquipmentItem) => item.current.data as Record<string, unknown>;

/** The select option for a library item: its ID, what it is, and any flag in words. */
export function equipmentOptionLabel(item: EquipmentItem): string {
  const fields = data(item);
  const facts: string[] = [];
  if (item.kind === 'balance') facts.push(`d = ${fields.readabilityG} g`, `max ${fields.capacityG} g`);
  if (item.kind === 'flask' || item.kind === 'glass-pipette')
    facts.push(`${fields.nominalMl} mL`, `class ${fields.glassClass}`, `± ${fields.toleranceMl} mL`);
  if (item.kind === 'piston-pipette') facts.push(`${fields.minVolumeUl}–${fields.maxVolumeUl} µL`);
  if (item.kind === 'solid-material') {
    const molarMass = molarMassOf(fields);
    facts.push(String(fields.formula), ...(molarMass === undefined ? [] : [molarMassText(molarMass)]));
    facts.push(`purity ${fields.purity}`);
  }
  if (item.kind === 'solution-material')
    facts.push(`${fields.analyte} ${fields.certifiedValue} ${fields.certifiedUnit}`);
  const flags = item.flags.length > 0 ? ` — ${item.flags.join('; ')}` : '';
  return `${item.code} (${facts.join(', ')})${flags}`;
}

/** The material's hazard notes as QA recorded them ('' for equipment and materials without notes). */
export function hazardNotesOf(item: EquipmentItem | undefined): string {
  const notes = item ? data(item).hazardNotes : undefined;
  return typeof notes === 'string' ? notes.trim() : '';
}

/** The analyte a material states by default (its `analyte` field: Pb for lead nitrate, Se for the selenium standard). */
export function defaultAnalyteOf(item: EquipmentItem): string {
  const analyte = data(item).analyte;
  return typeof analyte === 'string' ? analyte : '';
}
