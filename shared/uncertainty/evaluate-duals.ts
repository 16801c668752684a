import { DualNumber } from './dual-number';
import type { CompiledModel } from './model-types';

/**
 * Evaluates every node of the model's tape at the sources' estimates, carrying exact
 * first derivatives with respect to each source (forward-mode automatic differentiation).
 * @returns one DualNumber per tape node
 */
export function evaluateDuals(model: CompiledModel): DualNumber[] {
  const values: DualNumber[] = new Array(model.nodes.length);
  model.nodes.forEach((node, index) => {
    switch (node.operation) {
      case 'source': {
        const source = model.sources[node.sourceIndex];
        values[index] = DualNumber.source(source.id, source.estimate);
        return;
      }
      case 'constant':
        values[index] = DualNumber.constant(node.value);
        return;
      case 'add':
        values[index] = values[node.left].add(values[node.right]);
        return;
      case 'subtract':
        values[index] = values[node.left].subtract(values[node.right]);
        return;
      case 'multiply':
        values[index] = values[node.left].multiply(values[node.right]);
        return;
      case 'divide':
        values[index] = values[node.left].divide(values[node.right]);
    }
  });
  return values;
}

/**
 * Evaluates the model's output with plain numbers at the given source values
 * (`sourceValues[i]` for `model.sources[i]`); used for central differences and spot checks.
 */
export function evaluateAt(model: CompiledModel, sourceValues: ArrayLike<number>, node = model.outputNode): number {
  const values = new Float64Array(node + 1);
  for (let index = 0; index <= node; index += 1) {
    const entry = model.nodes[index];
    switch (entry.operation) {
      case 'source':
        values[index] = sourceValues[entry.sourceIndex];
        break;
      case 'constant':
        values[index] = entry.value;
        break;
      case 'add':
        values[index] = values[entry.left] + values[entry.right];
        break;
      case 'subtract':
        values[index] = values[entry.left] - values[entry.right];
        break;
      case 'multiply':
        values[index] = values[entry.left] * values[entry.right];
        break;
      case 'divide':
        values[index] = values[entry.left] / values[entry.right];
    }
  }
  return values[node];
}
