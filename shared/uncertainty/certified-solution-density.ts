import { z } from 'zod';
import type { CertifiedSolution } from './equipment-schema';
import type { NodeReference } from './model-builder';
import { PlanError } from './plan-error';
import type { StepContext } from './step-context';

const positive = (what: string) => z.number().finite().positive(`${what} must be greater than zero.`);
const nonNegative = (what: string) => z.number().finite().nonnegative(`${what} must be zero or positive.`);

/** Rows a lab's density table may hold (a plan carries the table, so it is capped like every list in a plan). */
export const MAXIMUM_MATRIX_DENSITIES = 50;

/** One row of the lab's table of matrix densities: "2 % HNO3" → 1.009 g/mL with its standard uncertainty. */
export const matrixDensitySchema = z
  .object({
    matrix: z.string().trim().min(1, 'Name the matrix, e.g. 2 % HNO3.').max(120),
    densityGPerMl: positive('The density').max(3, 'A solution density is at most 3 g/mL.'),
    standardUncertaintyGPerMl: nonNegative('The density uncertainty'),
  })
  .strict();

/**
 * Where the density of a certified solution comes from when its certificate gives none: the lab's table of
 * matrix densities (matched by the solution's matrix), else refuse, or take water's density at the lab
 * temperature with a standard uncertainty the lab sets, and warn.
 */
export const certifiedSolutionDensitySettingSchema = z
  .object({
    matrixDensities: z
      .array(matrixDensitySchema)
      .max(MAXIMUM_MATRIX_DENSITIES, `The density table can hold at most ${MAXIMUM_MATRIX_DENSITIES} matrices.`)
      .default([]),
    otherwise: z.enum(['refuse', 'assumeWater'], {
      error: 'Choose whether a solution of unknown density is refused or taken as water.',
    }),
    /** Standard uncertainty given to water's density when it stands in for the solution's (assumeWater). */
    waterStandardUncertaintyGPerMl: nonNegative('The uncertainty of the assumed density').default(0),
  })
  .strict();

/** A density in the model (g/mL): its node and its estimate. */
export interface DensityValue {
  node: NodeReference;
  estimateGPerMl: number;
}

/**
 * How a matrix is matched in the lab's table: exact after folding case, spaces and compatibility forms, so
 * "2 % HNO₃", "2% hno3" and "2 %  HNO3" are one matrix, and "2 % HNO3 + 0.5 % HCl" is another.
 */
export function matrixKey(matrix: string): string {
  return matrix.normalize('NFKC').toLowerCase().replace(/\s+/g, '');
}

/**
 * The density of a certified solution (g/mL), only when a conversion between mass fraction and mass
 * concentration (w·ρ) needs it: (1) its certificate's, with its uncertainty; (2) the lab's table entry for
 * its matrix, named in the budget row; (3) the lab's choice: refuse, or water at the lab temperature with the
 * lab's uncertainty and an `assumedWaterDensity` warning. A plan without the setting takes water's density
 * with no uncertainty, as plans did before it, and warns.
 * @throws PlanError when the lab refuses a solution of unknown density
 */
export function certifiedSolutionDensity(
  context: StepContext,
  material: CertifiedSolution,
  waterGPerMl: number,
  purpose: string,
): DensityValue {
  const known = knownCertifiedSolutionDensity(context, material);
  if (known !== undefined) return known;
  const setting = context.settings.certifiedSolutionDensity;
  const name = `${material.name} (${material.itemId})`;
  if (setting?.otherwise === 'refuse') {
    const table =
      material.matrix === undefined
        ? 'or give the solution its matrix in the library and add that matrix to the lab’s density table'
        : `or add its matrix ("${material.matrix}") to the lab’s density table`;
    throw new PlanError(
      [...context.path, 'material', 'densityGPerMl'],
      `${name} is certified in ${material.certifiedUnit} and ${purpose}, which needs the solution's density: enter the density from its certificate in the library, ${table}.`,
    );
  }
  const uncertainty = setting?.waterStandardUncertaintyGPerMl ?? 0;
  context.builder.warn({
    code: 'assumedWaterDensity',
    stepIndex: context.stepIndex,
    params: {
      materialItemId: material.itemId,
      materialName: material.name,
      certifiedUnit: material.certifiedUnit,
      densityGPerMl: waterGPerMl,
      standardUncertaintyGPerMl: uncertainty,
    },
  });
  // No setting (a plan from before it): water with no uncertainty, the very model such plans had, now with a warning.
  if (setting === undefined) return { estimateGPerMl: waterGPerMl, node: context.builder.constant(waterGPerMl) };
  return densityWithUncertainty(
    context,
    material,
    waterGPerMl,
    uncertainty,
    "density taken as water's (none on the certificate, matrix not in the lab's density table)",
  );
}

/** The density of a certified solution from its certificate or, failing that, the lab's table entry for its matrix. */
export function knownCertifiedSolutionDensity(
  context: StepContext,
  material: CertifiedSolution,
): DensityValue | undefined {
  if (material.densityGPerMl !== undefined) {
    return densityWithUncertainty(
      context,
      material,
      material.densityGPerMl,
      material.densityStandardUncertaintyGPerMl ?? 0,
      'density',
    );
  }
  const matrix = material.matrix;
  if (matrix === undefined) return undefined;
  const entry = context.settings.certifiedSolutionDensity?.matrixDensities.find(
    (row) => matrixKey(row.matrix) === matrixKey(matrix),
  );
  if (entry === undefined) return undefined;
  return densityWithUncertainty(
    context,
    material,
    entry.densityGPerMl,
    entry.standardUncertaintyGPerMl,
    `density of its matrix "${entry.matrix}" (lab's density table)`,
  );
}

function densityWithUncertainty(
  context: StepContext,
  material: CertifiedSolution,
  estimateGPerMl: number,
  standardUncertaintyGPerMl: number,
  label: string,
): DensityValue {
  const { builder } = context;
  return {
    estimateGPerMl,
    node: builder.add(
      builder.constant(estimateGPerMl),
      builder.source({
        id: `item:${material.itemId}:density`,
        label: `${material.name} (${material.itemId}): ${label}`,
        category: 'density',
        estimate: 0,
        unit: 'g/mL',
        distribution: { shape: 'normal', standardUncertainty: standardUncertaintyGPerMl },
        sharing: 'item',
        itemId: material.itemId,
        stepIndex: context.stepIndex,
        path: [...context.path, 'material', 'densityStandardUncertaintyGPerMl'],
      }),
    ),
  };
}
