import type { z } from 'zod';
import type { extraSourceSchema } from './distribution-schema';
import type { NodeReference } from './model-builder';
import type { StepContext } from './step-context';

type ExtraSource = z.infer<typeof extraSourceSchema>;

/** Adds the step's 'absolute' extra sources to its own quantity: q + Σ δᵢ (δᵢ in `unit`, estimate 0). */
export function addAbsoluteExtraSources(
  context: StepContext,
  quantity: NodeReference,
  extras: ExtraSource[],
  unit: string,
): NodeReference {
  return extras.reduce((total, extra, index) => {
    if (extra.effect !== 'absolute') return total;
    return context.builder.add(total, extraSourceNode(context, extra, index, unit));
  }, quantity);
}

/** Applies the step's 'relative' extra sources to its result: y·Π(1 + δᵢ) (δᵢ dimensionless, estimate 0). */
export function applyRelativeExtraSources(
  context: StepContext,
  result: NodeReference,
  extras: ExtraSource[],
): NodeReference {
  return extras.reduce((total, extra, index) => {
    if (extra.effect !== 'relative') return total;
    const factor = context.builder.add(context.builder.constant(1), extraSourceNode(context, extra, index, '1'));
    return context.builder.multiply(total, factor);
  }, result);
}

function extraSourceNode(context: StepContext, extra: ExtraSource, index: number, unit: string): NodeReference {
  return context.builder.source({
    id: `step:${context.stepIndex}:extra:${index}`,
    label: `Step ${context.stepIndex + 1}: ${extra.name}`,
    category: 'userDefined',
    estimate: 0,
    unit,
    distribution: extra.distribution,
    sharing: 'use',
    stepIndex: context.stepIndex,
    path: [...context.path, 'extraSources', index, 'distribution'],
  });
}
