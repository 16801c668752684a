import { toEngineEquipment } from '../../shared/contracts/engine-equipment';
import type { EquipmentItem } from '../../shared/contracts/library';
import type { Client } from './test-app';

/** The demo lab's library by code, as the planner reads it. */
export async function libraryByCode(client: Client, labId: number): Promise<Map<string, EquipmentItem>> {
  const items = (await client.get(`/api/labs/${labId}/equipment?status=all`).expect(200)).body as EquipmentItem[];
  return new Map(items.map((item) => [item.code, item]));
}

/** Lead standard from the demo lead nitrate: 0.1599 g to 100 mL, then 10 mL to 100 mL (invented demo plan). */
export function leadPlan(
  library: Map<string, EquipmentItem>,
  choice: { balance?: string; aliquotFlask?: string } = {},
) {
  const use = (code: string) => toEngineEquipment(library.get(code)!);
  return {
    formatVersion: 1,
    title: 'Pb 100 mg/L intermediate',
    analyte: { formula: 'Pb' },
    settings: { outputUnit: 'mg/L', labTemperatureC: 20 },
    steps: [
      { kind: 'weighSolid', material: use('RM-PBN-01'), balance: use(choice.balance ?? 'BAL-05'), netMassG: 0.1599 },
      { kind: 'makeUpToVolume', flask: use('VF-100-A') },
      { kind: 'pipetteAliquot', pipette: use('GP-10-A'), volumeMl: 10 },
      { kind: 'makeUpToVolume', flask: use(choice.aliquotFlask ?? 'VF-100-B') },
    ],
  };
}

/** The demo lead standard planned by the analyst as version 1, a draft; returns the preparation id. */
export async function plannedLeadStandard(analyst: Client, labId: number): Promise<number> {
  const library = await libraryByCode(analyst, labId);
  return (
    await analyst
      .post(`/api/labs/${labId}/preparations`, { title: 'Pb check standard', plan: leadPlan(library) })
      .expect(201)
  ).body.id as number;
}

/** A demo lead standard planned by the analyst, submitted, and approved by QA; returns the preparation id. */
export async function approvedLeadStandard(
  analyst: Client,
  qa: Client,
  labId: number,
  password: string,
): Promise<number> {
  const id = await plannedLeadStandard(analyst, labId);
  await analyst.post(`/api/labs/${labId}/preparations/${id}/versions/1/submit`, {}).expect(200);
  await qa
    .post(`/api/labs/${labId}/preparations/${id}/versions/1/approve`, { password, statement: 'Approved for use.' })
    .expect(200);
  return id;
}
