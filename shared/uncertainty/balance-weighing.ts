import { calibrationCorrectionLabel } from './calibration-label';
import type { Distribution } from './distributions';
import type { Balance } from './equipment-schema';
import { minimumWeightG } from './minimum-weight';
import type { NodeReference } from './model-builder';
import type { SourceCategory } from './model-types';
import { PlanError } from './plan-error';
import { itemLabel, type StepContext } from './step-context';

/**
 * Half-width of the linearity error of each reading (g) that does not cancel in gross − tare.
 * With e_gross = √r·s + √(1−r)·a₁ and e_tare = √r·s + √(1−r)·a₂ (s, a₁, a₂ independent, each rectangular ± a)
 * the common part √r·s cancels in the net mass, leaving √(1−r)·a per reading: u²(net) = 2·u²(1 − r).
 * r is the plan's linearityCorrelation when the net mass is at most linearityCorrelationNetFraction of the
 * capacity (the two loads are close on the balance's error curve), otherwise 0: independent readings, as
 * EURACHEM/CITAC CG4 3rd ed. A1 counts the linearity twice. The correlated option is common practice, no document.
 * @example linearityHalfWidthG(0.0002, 0.75, true) // 0.0001
 */
export function linearityHalfWidthG(linearityG: number, correlation: number, loadsClose: boolean): number {
  return loadsClose ? Math.sqrt(1 - correlation) * linearityG : linearityG;
}

/**
 * Net mass weighed by difference on a balance, in g:
 * m = (m₀ + Σ e_gross − Σ e_tare)·(1 + δ_sensitivity), where each reading carries repeatability
 * (normal, s; or Type A, Student t with ν = n − 1 when the balance gives the n readings behind s), readability
 * (rectangular, d/2) and linearity (rectangular, see linearityHalfWidthG), drawn afresh per reading, and
 * δ_sensitivity (normal, U_rel/k) is one source for the balance, shared by all its weighings: its estimate is
 * the certificate's relative correction of the indication when one is entered, else 0.
 * Warns when m is below the USP <41> minimum weight; @throws PlanError when the load exceeds the capacity.
 */
export function weighByDifference(
  context: StepContext,
  balance: Balance,
  netMassG: number,
  containerMassG: number,
  massField: string,
): NodeReference {
  const { builder, stepIndex, path } = context;
  const name = itemLabel('Balance', balance.itemId);
  if (containerMassG + netMassG > balance.capacityG) {
    throw new PlanError(
      [...path, massField],
      `${name} holds at most ${balance.capacityG} g; container ${containerMassG} g plus ${netMassG} g is more.`,
    );
  }
  // A net mass below one scale interval d is not a reading the balance can give (common practice).
  if (netMassG < balance.readabilityG) {
    throw new PlanError(
      [...path, massField],
      `${netMassG} g is less than ${name} can read (its scale interval is ${balance.readabilityG} g); weigh more, or use a finer balance.`,
    );
  }
  const minimum = minimumWeightG(balance.repeatabilityG, balance.readabilityG);
  if (netMassG < minimum) {
    builder.warn({
      code: 'belowMinimumWeight',
      stepIndex,
      params: { balanceItemId: balance.itemId, netMassG, minimumWeightG: minimum },
    });
  }
  const { linearityCorrelation, linearityCorrelationNetFraction } = context.settings;
  const loadsClose = linearityCorrelation > 0 && netMassG <= linearityCorrelationNetFraction * balance.capacityG;
  const linearityG = linearityHalfWidthG(balance.linearityG, linearityCorrelation, loadsClose);
  const linearityName = loadsClose
    ? `linearity, part not shared with the other reading (r = ${linearityCorrelation})`
    : 'linearity';
  const readingErrors = (reading: 'gross' | 'tare') => {
    const parts: [string, SourceCategory, Distribution, number][] = [
      ['repeatability', 'balanceRepeatability', repeatabilityDistribution(balance), balance.repeatabilityG],
      [
        'readability',
        'balanceReadability',
        { shape: 'rectangular', halfWidth: balance.readabilityG / 2 },
        balance.readabilityG,
      ],
      ['linearity', 'balanceLinearity', { shape: 'rectangular', halfWidth: linearityG }, linearityG],
    ];
    return parts
      .filter(([, , , size]) => size > 0)
      .map(([component, category, distribution]) =>
        builder.source({
          id: `step:${stepIndex}:${reading}:${component}`,
          label: `Step ${stepIndex + 1}: ${name} ${component === 'linearity' ? linearityName : component} (${reading} reading)`,
          category,
          estimate: 0,
          unit: 'g',
          distribution,
          sharing: 'use',
          itemId: balance.itemId,
          stepIndex,
          path: [...path, 'balance'],
        }),
      );
  };
  let net = builder.constant(netMassG);
  for (const error of readingErrors('gross')) net = builder.add(net, error);
  for (const error of readingErrors('tare')) net = builder.subtract(net, error);
  const sensitivity = balance.sensitivity;
  const correction = sensitivity?.relativeCorrection;
  if (sensitivity !== undefined && (sensitivity.relativeExpandedUncertainty > 0 || correction !== undefined)) {
    const deviation = builder.source({
      id: `item:${balance.itemId}:sensitivity`,
      label:
        correction === undefined
          ? `${name}: sensitivity (calibration)`
          : calibrationCorrectionLabel(`${name} indication`, correction, '(relative)', sensitivity),
      category: correction === undefined ? 'balanceSensitivity' : 'calibrationCorrection',
      estimate: correction ?? 0,
      unit: '1',
      distribution: {
        shape: 'normal',
        expandedUncertainty: sensitivity.relativeExpandedUncertainty,
        coverageFactor: sensitivity.coverageFactor,
      },
      sharing: 'item',
      itemId: balance.itemId,
      stepIndex,
      path: [...path, 'balance', 'sensitivity'],
    });
    net = builder.multiply(net, builder.add(builder.constant(1), deviation));
  }
  return net;
}

/**
 * The repeatability s of one reading: Type A from the n readings it was computed from, a single new reading
 * (u = s, ν = n − 1, JCGM 100:2008 4.2.6), when the balance gives n; otherwise normal with u = s, taken as exact.
 */
function repeatabilityDistribution(balance: Balance): Distribution {
  return balance.repeatabilityReadings === undefined
    ? { shape: 'normal', standardUncertainty: balance.repeatabilityG }
    : {
        shape: 'studentT',
        standardDeviation: balance.repeatabilityG,
        observations: balance.repeatabilityReadings,
        meanOfReadings: false,
      };
}
