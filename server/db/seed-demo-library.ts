import { createHash, randomUUID } from 'node:crypto';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { equipmentDataSchemas, type EquipmentKind } from '../../shared/contracts/library';
import { GLASSWARE_TEMPLATES, PISTON_TEMPLATES } from '../../shared/contracts/equipment-templates';
import { libraryRepository } from '../library/library-repository';
import type { Db } from './connection';
import { demoCertificatePdf } from './demo-certificates';

const day = 86_400_000;
const dateOffset = (now: Date, days: number) => new Date(now.getTime() + days * day).toISOString().slice(0, 10);

function isoTolerance(kind: 'flask' | 'glass-pipette', glassClass: 'A' | 'B', nominalMl: number): number {
  const row = GLASSWARE_TEMPLATES.find(
    (t) => t.kind === kind && t.glassClass === glassClass && t.nominalMl === nominalMl,
  );
  if (!row) throw new Error(`no ${kind} template for ${glassClass} ${nominalMl} mL`);
  return row.toleranceMl;
}

/**
 * The demo lab's library: two balances, class A and B flasks, glass and piston pipettes and two
 * reference materials. Tolerances come from the ISO templates; everything else (IDs, fill
 * repeatabilities, certificate figures, lots) is invented for the demo.
 */
export function demoLibrary(
  now: Date,
): { kind: EquipmentKind; data: Record<string, unknown>; certificate?: Parameters<typeof demoCertificatePdf>[0] }[] {
  const calibrated = dateOffset(now, -150);
  const due = dateOffset(now, 215);
  const flasks = [10, 25, 50, 100, 200, 250, 500, 1000].map((nominalMl) => ({
    kind: 'flask' as const,
    data: {
      code: `VF-${nominalMl}-A`,
      description: `${nominalMl} mL one-mark volumetric flask, class A, borosilicate`,
      nominalMl,
      glassClass: 'A',
      toleranceMl: isoTolerance('flask', 'A', nominalMl),
      toleranceDistribution: null,
      fillRepeatabilityMl: Number((isoTolerance('flask', 'A', nominalMl) * 0.2).toPrecision(2)),
      calibrationTemperatureC: 20,
    },
  }));
  const flasksB = [100, 250, 1000].map((nominalMl) => ({
    kind: 'flask' as const,
    data: {
      code: `VF-${nominalMl}-B`,
      description: `${nominalMl} mL one-mark volumetric flask, class B`,
      nominalMl,
      glassClass: 'B',
      toleranceMl: isoTolerance('flask', 'B', nominalMl),
      toleranceDistribution: null,
      fillRepeatabilityMl: Number((isoTolerance('flask', 'B', nominalMl) * 0.2).toPrecision(2)),
      calibrationTemperatureC: 20,
    },
  }));
  const pipettes = [1, 2, 5, 10, 20, 25].map((nominalMl) => ({
    kind: 'glass-pipette' as const,
    data: {
      code: `GP-${nominalMl}-A`,
      description: `${nominalMl} mL one-mark bulb pipette, class A`,
      nominalMl,
      glassClass: 'A',
      toleranceMl: isoTolerance('glass-pipette', 'A', nominalMl),
      toleranceDistribution: null,
      fillRepeatabilityMl: Number((isoTolerance('glass-pipette', 'A', nominalMl) * 0.25).toPrecision(2)),
      calibrationTemperatureC: 20,
    },
  }));
  const piston = [
    { code: 'PP-10', min: 1, max: 10 },
    { code: 'PP-100', min: 10, max: 100 },
    { code: 'PP-1000', min: 100, max: 1000 },
  ].map(({ code, min, max }) => {
    const iso = PISTON_TEMPLATES.find((t) => t.nominalUl === max)!;
    return {
      kind: 'piston-pipette' as const,
      data: {
        code,
        description: `Adjustable piston pipette ${min}–${max} µL`,
        adjustable: true,
        minVolumeUl: min,
        maxVolumeUl: max,
        errorBasis: 'iso-8655',
        points: [{ volumeUl: max, systematicErrorUl: iso.systematicErrorUl, randomErrorUl: iso.randomErrorUl }],
        calibratedOn: calibrated,
        calibrationDueOn: due,
      },
    };
  });
  return [
    {
      kind: 'balance',
      data: {
        code: 'BAL-05',
        description: 'Five-place analytical balance, weighing room 2',
        capacityG: 220,
        readabilityG: 0.00001,
        repeatabilityG: 0.000015,
        linearityG: 0.00003,
        sensitivityRelativeExpanded: 0.0000025,
        sensitivityCoverageFactor: 2,
        certificateReference: 'WCS-26-0412',
        calibratedOn: calibrated,
        calibrationDueOn: due,
      },
      certificate: {
        title: 'Calibration certificate — analytical balance BAL-05',
        issuer: 'Wellmere Calibration Services (invented)',
        reference: 'WCS-26-0412',
        issuedOn: calibrated,
        lines: [
          ['Capacity / readability', '220 g / 0.01 mg'],
          ['Repeatability (10 × 10 g)', 's = 0.015 mg'],
          ['Linearity', '± 0.03 mg'],
          ['Expanded uncertainty at 200 g', '0.50 mg (k = 2), i.e. 2.5 × 10⁻⁶ relative'],
        ],
      },
    },
    {
      kind: 'balance',
      data: {
        code: 'BAL-04',
        description: 'Four-place analytical balance, preparation bench',
        capacityG: 320,
        readabilityG: 0.0001,
        repeatabilityG: 0.00008,
        linearityG: 0.0002,
        sensitivityRelativeExpanded: 0.000005,
        sensitivityCoverageFactor: 2,
        certificateReference: 'WCS-25-1187',
        calibratedOn: dateOffset(now, -345),
        calibrationDueOn: dateOffset(now, 20),
      },
    },
    ...flasks,
    ...flasksB,
    ...pipettes,
    ...piston,
    {
      kind: 'solid-material',
      data: {
        code: 'RM-PBN-01',
        name: 'Lead(II) nitrate, certified reference material',
        lot: 'PBN-24117',
        supplier: 'Northgate Reference Materials (invented)',
        expiresOn: dateOffset(now, 420),
        certificateReference: 'NRM-PBN-24117',
        hazardNotes:
          'Lead compounds are toxic (reproductive toxicity, organ damage on repeated exposure) and lead nitrate is an oxidiser. Weigh in a ventilated enclosure, wear gloves, collect waste as heavy-metal waste.',
        formula: 'Pb(NO3)2',
        analyte: 'Pb',
        purity: 0.9998,
        purityUncertainty: { shape: 'normal', expandedUncertainty: 0.0002, coverageFactor: 2 },
        // Lead(II) nitrate 4.53 g/cm³ (from memory; a safety data sheet gives it), for air buoyancy.
        densityGPerCm3: 4.53,
      },
      certificate: {
        title: 'Certificate of analysis — lead(II) nitrate',
        issuer: 'Northgate Reference Materials (invented)',
        reference: 'NRM-PBN-24117',
        issuedOn: dateOffset(now, -300),
        lines: [
          ['Lot', 'PBN-24117'],
          ['Purity (mass fraction)', '0.9998 ± 0.0002 (k = 2)'],
          ['Density', '4.53 g/cm³'],
          ['Expiry', dateOffset(now, 420)],
        ],
      },
    },
    {
      kind: 'solution-material',
      data: {
        code: 'RM-SE-1000',
        name: 'Selenium single-element standard, 1000 mg/L',
        lot: 'SE-25-0731',
        supplier: 'Northgate Reference Materials (invented)',
        expiresOn: dateOffset(now, 240),
        openedOn: dateOffset(now, -20),
        certificateReference: 'NRM-SE-25-0731',
        hazardNotes:
          'Selenium is toxic if swallowed or inhaled; the solution is in 2 % nitric acid (corrosive). Work in a fume hood with gloves and eye protection.',
        analyte: 'Se',
        certifiedValue: 1000,
        certifiedUnit: 'mg/L',
        expandedUncertainty: 3,
        coverageFactor: 2,
        matrix: '2 % HNO3',
        densityGPerMl: 1.011,
        densityUncertaintyGPerMl: 0.002,
      },
      certificate: {
        title: 'Certificate of analysis — selenium standard 1000 mg/L',
        issuer: 'Northgate Reference Materials (invented)',
        reference: 'NRM-SE-25-0731',
        issuedOn: dateOffset(now, -200),
        lines: [
          ['Certified value', '1000 mg/L ± 3 mg/L (k = 2)'],
          ['Matrix', '2 % HNO₃'],
          ['Density at 20 °C', '1.011 g/mL'],
        ],
      },
    },
  ];
}

/** Writes the demo library into the lab, as `ownerId`, inside the caller's transaction. */
export async function seedDemoLibrary(
  trx: Db,
  input: { labId: number; ownerId: number; now: Date; certificateDir: string },
): Promise<void> {
  const library = libraryRepository(trx);
  const at = input.now.toISOString();
  for (const entry of demoLibrary(input.now)) {
    const data = equipmentDataSchemas[entry.kind].parse(entry.data) as { code: string };
    const itemId = await library.insertItem(
      { labId: input.labId, kind: entry.kind, code: data.code, createdAt: at, createdBy: input.ownerId },
      trx,
    );
    const revisionId = await library.appendRevision(
      itemId,
      { data, reason: 'Demo lab library', createdAt: at, createdBy: input.ownerId, code: data.code },
      trx,
    );
    if (!entry.certificate) continue;
    const pdf = await demoCertificatePdf(entry.certificate);
    mkdirSync(input.certificateDir, { recursive: true });
    const storedName = `${randomUUID()}.pdf`;
    writeFileSync(join(input.certificateDir, storedName), pdf, { mode: 0o600 });
    await library.insertCertificate({
      lab_id: input.labId,
      item_id: itemId,
      revision_id: revisionId,
      original_name: `${entry.certificate.reference}.pdf`,
      stored_name: storedName,
      media_type: 'application/pdf',
      size_bytes: pdf.length,
      sha256: createHash('sha256').update(pdf).digest('hex'),
      uploaded_by: input.ownerId,
      uploaded_at: at,
    });
  }
}
