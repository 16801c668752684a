import type { CompiledModel } from './model-types';

/**
 * Evaluates the model's tape over columns of trials: each node's values for a chunk of trials sit in one
 * Float64Array, so every operation is a tight loop. Buffers are allocated once per chunk size and reused.
 */
export class ColumnEvaluator {
  readonly chunkSize: number;
  /** One column per source, filled by the caller before `evaluate`. */
  readonly sourceColumns: Float64Array[];
  private readonly model: CompiledModel;
  private readonly columns: (Float64Array | undefined)[];
  private readonly scalars: Float64Array;

  constructor(model: CompiledModel, chunkSize: number) {
    this.model = model;
    this.chunkSize = chunkSize;
    this.sourceColumns = model.sources.map(() => new Float64Array(chunkSize));
    this.scalars = new Float64Array(model.nodes.length);
    this.columns = model.nodes.map((node, index) => {
      if (node.operation === 'source') return this.sourceColumns[node.sourceIndex];
      if (node.operation === 'constant') {
        this.scalars[index] = node.value;
        return undefined;
      }
      return new Float64Array(chunkSize);
    });
  }

  /** Runs the tape for the first `count` trials of the chunk; returns the output column (or fills it with a constant). */
  evaluate(count: number): Float64Array {
    const { nodes, outputNode } = this.model;
    for (let index = 0; index <= outputNode; index += 1) {
      const node = nodes[index];
      if (node.operation === 'source' || node.operation === 'constant') continue;
      const out = this.columns[index] as Float64Array;
      const left = this.columns[node.left];
      const right = this.columns[node.right];
      const leftScalar = this.scalars[node.left];
      const rightScalar = this.scalars[node.right];
      if (left !== undefined && right !== undefined) binaryColumns(node.operation, out, left, right, count);
      else if (left !== undefined) columnScalar(node.operation, out, left, rightScalar, count);
      else if (right !== undefined) scalarColumn(node.operation, out, leftScalar, right, count);
    }
    const output = this.columns[outputNode];
    if (output !== undefined) return output;
    const constant = new Float64Array(count);
    constant.fill(this.scalars[outputNode]);
    return constant;
  }
}

type Operation = 'add' | 'subtract' | 'multiply' | 'divide';

function binaryColumns(operation: Operation, out: Float64Array, left: Float64Array, right: Float64Array, count: number): void {
  switch (operation) {
    case 'add':
      for (let index = 0; index < count; index += 1) out[index] = left[index] + right[index];
      return;
    case 'subtract':
      for (let index = 0; index < count; index += 1) out[index] = left[index] - right[index];
      return;
    case 'multiply':
      for (let index = 0; index < count; index += 1) out[index] = left[index] * right[index];
      return;
    case 'divide':
      for (let index = 0; index < count; index += 1) out[index] = left[index] / right[index];
  }
}

function columnScalar(operation: Operation, out: Float64Array, left: Float64Array, right: number, count: number): void {
  switch (operation) {
    case 'add':
      for (let index = 0; index < count; index += 1) out[index] = left[index] + right;
      return;
    case 'subtract':
      for (let index = 0; index < count; index += 1) out[index] = left[index] - right;
      return;
    case 'multiply':
      for (let index = 0; index < count; index += 1) out[index] = left[index] * right;
      return;
    case 'divide':
      for (let index = 0; index < count; index += 1) out[index] = left[index] / right;
  }
}

function scalarColumn(operation: Operation, out: Float64Array, left: number, right: Float64Array, count: number): void {
  switch (operation) {
    case 'add':
      for (let index = 0; index < count; index += 1) out[index] = left + right[index];
      return;
    case 'subtract':
      for (let index = 0; index < count; index += 1) out[index] = left - right[index];
      return;
    case 'multiply':
      for (let index = 0; index < count; index += 1) out[index] = left * right[index];
      return;
    case 'divide':
      for (let index = 0; index < count; index += 1) out[index] = left / right[index];
  }
}
