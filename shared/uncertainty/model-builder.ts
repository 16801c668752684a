import {
  checkDistribution,
  degreesOfFreedom,
  evaluationType,
  standardUncertainty,
  type Distribution,
} from './distributions';
import type { EngineWarning } from './engine-warning';
import type { Checkpoint, CompiledModel, SourceCategory, SourceDefinition, TapeNode } from './model-types';
import { PlanError, type PlanPathSegment } from './plan-error';

/** Index of a node on the model's tape. */
export type NodeReference = number;

export interface SourceRequest {
  id: string;
  label: string;
  category: SourceCategory;
  estimate: number;
  unit: string;
  distribution: Distribution;
  sharing: 'item' | 'use';
  itemId?: string;
  stepIndex: number;
  /** Where the source's data sit in the plan, for error messages. */
  path: PlanPathSegment[];
}

/**
 * Records a measurement model as a tape while step code describes it.
 * A source requested twice under one id (a shared item) becomes one source and one node.
 */
export class ModelBuilder {
  private readonly sources: SourceDefinition[] = [];
  private readonly sourceNodes = new Map<string, NodeReference>();
  private readonly nodes: TapeNode[] = [];
  /** Each node's value at the sources' estimates, in step with `nodes`. */
  private readonly estimates: number[] = [];
  private readonly checkpoints: Checkpoint[] = [];
  private readonly warnings: EngineWarning[] = [];

  /** The node of a source; the same id always gives the same node. @throws PlanError on conflicting data */
  source(request: SourceRequest): NodeReference {
    const existing = this.sourceNodes.get(request.id);
    if (existing !== undefined) {
      const node = this.nodes[existing];
      const definition = this.sources[node.operation === 'source' ? node.sourceIndex : -1];
      if (
        definition.estimate !== request.estimate ||
        JSON.stringify(definition.distribution) !== JSON.stringify(request.distribution)
      ) {
        throw new PlanError(
          request.path,
          `${request.label}: the same item appears twice with different data; give each physical item one description.`,
        );
      }
      if (!definition.stepIndices.includes(request.stepIndex)) definition.stepIndices.push(request.stepIndex);
      return existing;
    }
    checkDistribution(request.distribution, request.path);
    const definition: SourceDefinition = {
      id: request.id,
      label: request.label,
      category: request.category,
      estimate: request.estimate,
      unit: request.unit,
      distribution: request.distribution,
      standardUncertainty: standardUncertainty(request.distribution),
      degreesOfFreedom: degreesOfFreedom(request.distribution),
      evaluationType: evaluationType(request.distribution),
      sharing: request.sharing,
      stepIndices: [request.stepIndex],
      ...(request.itemId === undefined ? {} : { itemId: request.itemId }),
    };
    this.sources.push(definition);
    const node = this.push({ operation: 'source', sourceIndex: this.sources.length - 1 });
    this.sourceNodes.set(request.id, node);
    return node;
  }

  constant(value: number): NodeReference {
    return this.push({ operation: 'constant', value });
  }

  add(left: NodeReference, right: NodeReference): NodeReference {
    return this.binary('add', left, right);
  }

  subtract(left: NodeReference, right: NodeReference): NodeReference {
    return this.binary('subtract', left, right);
  }

  multiply(left: NodeReference, right: NodeReference): NodeReference {
    return this.binary('multiply', left, right);
  }

  divide(left: NodeReference, right: NodeReference): NodeReference {
    return this.binary('divide', left, right);
  }

  /** left · value, for a known constant factor. */
  scale(left: NodeReference, value: number): NodeReference {
    return value === 1 ? left : this.multiply(left, this.constant(value));
  }

  /** Sum of the given nodes (at least one). */
  sum(terms: NodeReference[]): NodeReference {
    return terms.reduce((total, term) => this.add(total, term));
  }

  checkpoint(checkpoint: Checkpoint): void {
    this.checkpoints.push(checkpoint);
  }

  warn(warning: EngineWarning): void {
    this.warnings.push(warning);
  }

  /** A node's value with every source at its estimate (e.g. the density used to compare a mass with a volume). */
  estimate(node: NodeReference): number {
    return this.estimates[node];
  }

  constantValue(node: NodeReference): number | undefined {
    const entry = this.nodes[node];
    return entry.operation === 'constant' ? entry.value : undefined;
  }

  build(
    outputNode: NodeReference,
    outputUnit: string,
    measurand: string,
    referenceTemperatureC?: number,
  ): CompiledModel {
    return {
      modelFormat: 'dilutrace-model/1',
      ...(referenceTemperatureC === undefined ? {} : { referenceTemperatureC }),
      sources: this.sources.map((source) => ({ ...source, stepIndices: [...source.stepIndices] })),
      nodes: [...this.nodes],
      outputNode,
      outputUnit,
      measurand,
      checkpoints: [...this.checkpoints],
      warnings: [...this.warnings, ...this.infiniteVarianceWarnings()],
    };
  }

  /**
   * One warning per step whose sources Monte Carlo draws from a Student t with ν ≤ 2: the variance of t_ν is
   * ν/(ν − 2)·scale² only for ν > 2 (JCGM 101:2008 6.4.9, from memory), infinite or undefined below. Such inputs
   * are kept, not refused: the t distribution still has finite quantiles, so the coverage interval (JCGM 101:2008
   * 7.7) and the GUM result stand; only the Monte Carlo standard deviation is meaningless.
   */
  private infiniteVarianceWarnings(): EngineWarning[] {
    const byStep = new Map<number, SourceDefinition[]>();
    for (const source of this.sources) {
      if (!(source.degreesOfFreedom <= 2)) continue;
      const step = source.stepIndices[0];
      byStep.set(step, [...(byStep.get(step) ?? []), source]);
    }
    return [...byStep]
      .sort(([left], [right]) => left - right)
      .map(([stepIndex, sources]) => ({
        code: 'infiniteMonteCarloVariance',
        stepIndex,
        params: {
          sourceLabels: sources.map((source) => source.label),
          degreesOfFreedom: Math.min(...sources.map((source) => source.degreesOfFreedom)),
        },
      }));
  }

  private binary(
    operation: 'add' | 'subtract' | 'multiply' | 'divide',
    left: NodeReference,
    right: NodeReference,
  ): NodeReference {
    const leftValue = this.constantValue(left);
    const rightValue = this.constantValue(right);
    if (leftValue !== undefined && rightValue !== undefined) {
      return this.constant(applyOperation(operation, leftValue, rightValue));
    }
    if ((operation === 'add' || operation === 'subtract') && rightValue === 0) return left;
    if (operation === 'add' && leftValue === 0) return right;
    if ((operation === 'multiply' || operation === 'divide') && rightValue === 1) return left;
    if (operation === 'multiply' && leftValue === 1) return right;
    return this.push({ operation, left, right });
  }

  private push(node: TapeNode): NodeReference {
    this.estimates.push(
      node.operation === 'source'
        ? this.sources[node.sourceIndex].estimate
        : node.operation === 'constant'
          ? node.value
          : applyOperation(node.operation, this.estimates[node.left], this.estimates[node.right]),
    );
    this.nodes.push(node);
    return this.nodes.length - 1;
  }
}

/** The four operations of the tape on plain numbers. */
export function applyOperation(
  operation: 'add' | 'subtract' | 'multiply' | 'divide',
  left: number,
  right: number,
): number {
  switch (operation) {
    case 'add':
      return left + right;
    case 'subtract':
      return left - right;
    case 'multiply':
      return left * right;
    case 'divide':
      return left / right;
  }
}
