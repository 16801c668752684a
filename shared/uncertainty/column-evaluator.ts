import type { CompiledModel } from './model-types';

/**
 * Operation codes of the compiled program. An operation combines the running value r of a chain with one
 * operand x; the last two are the tape's subtract and divide with the running value on the right.
 */
const add = 0; // r + x
const subtract = 1; // r − x
const multiply = 2; // r · x
const divide = 3; // r / x
const subtractFrom = 4; // x − r
const divideInto = 5; // x / r
const operationCode = { add, subtract, multiply, divide } as const;

/** The most tape operations one pass carries out per trial (chains of 1 to 4 operations have their own loop). */
const longestChain = 4;

/**
 * One pass over the chunk: out = (((x₀ ∘₁ x₁) ∘₂ x₂) ∘₃ …), a chain of tape operations in which every
 * intermediate value is read by the next operation only, so it stays in a register. The operands are
 * columns: sources, constants (filled once) or outputs of earlier passes.
 */
interface Chain {
  operations: number[];
  operands: Float64Array[];
  out: Float64Array;
  /** For additive chains: σₖ of each operation's operand and ρₖ of the running value (see operandSign, runningSign). */
  operandSigns: number[];
  runningSigns: number[];
}

/**
 * Evaluates the model's tape over columns of trials: each node's values for a chunk of trials sit in one
 * Float64Array, so every operation is a tight loop. The tape is compiled once into a short program of
 * chains: operations on two constants are folded, constants become columns filled once, and a node whose
 * operand is an intermediate read by it alone continues that operand's chain instead of starting a pass
 * of its own. Every tape operation is still carried out once per trial, in the same IEEE order and with
 * the same operands (a + b and a·b are commutative in IEEE arithmetic), so the results are exactly those
 * of evaluating the tape node by node. Buffers are allocated once per chunk size and reused.
 */
export class ColumnEvaluator {
  readonly chunkSize: number;
  /** One column per source, filled by the caller before `evaluate`. */
  readonly sourceColumns: Float64Array[];
  private readonly program: Chain[];

  constructor(model: CompiledModel, chunkSize: number) {
    this.chunkSize = chunkSize;
    this.sourceColumns = model.sources.map(() => new Float64Array(chunkSize));
    const { nodes, outputNode } = model;
    const isOperation = (index: number) => nodes[index].operation !== 'source' && nodes[index].operation !== 'constant';

    // Constants, with operations on two constants folded (the same IEEE operation, done once).
    const constants = nodes.map((node): number | undefined => (node.operation === 'constant' ? node.value : undefined));
    nodes.forEach((node, index) => {
      if (node.operation === 'source' || node.operation === 'constant') return;
      const left = constants[node.left];
      const right = constants[node.right];
      if (left !== undefined && right !== undefined)
        constants[index] = combine(operationCode[node.operation], left, right);
    });
    const isComputed = (index: number) => isOperation(index) && constants[index] === undefined;

    // Nodes the output depends on, and how often each is read by them.
    const needed = nodes.map(() => false);
    const uses = nodes.map(() => 0);
    needed[outputNode] = true;
    for (let index = outputNode; index >= 0; index -= 1) {
      const node = nodes[index];
      if (!needed[index] || !isComputed(index) || node.operation === 'source' || node.operation === 'constant')
        continue;
      needed[node.left] = needed[node.right] = true;
      uses[node.left] += 1;
      uses[node.right] += 1;
    }

    // Chains: a node continues the chain of an operand that is computed, read only by it, and not yet full.
    const chainOf = nodes.map((): { operations: number[]; operands: number[] } | undefined => undefined);
    const continues = nodes.map(() => false);
    const canContinue = (index: number, code: number) => {
      const chain = chainOf[index];
      return isComputed(index) && uses[index] === 1 && chain !== undefined && isRunnable([...chain.operations, code]);
    };
    for (let index = 0; index <= outputNode; index += 1) {
      const node = nodes[index];
      if (!needed[index] || !isComputed(index) || node.operation === 'source' || node.operation === 'constant')
        continue;
      const code = operationCode[node.operation];
      const reversed = code === subtract ? subtractFrom : code === divide ? divideInto : code;
      if (canContinue(node.left, code)) {
        const chain = chainOf[node.left] as { operations: number[]; operands: number[] };
        chainOf[index] = { operations: [...chain.operations, code], operands: [...chain.operands, node.right] };
        continues[node.left] = true;
      } else if (canContinue(node.right, reversed)) {
        const chain = chainOf[node.right] as { operations: number[]; operands: number[] };
        chainOf[index] = { operations: [...chain.operations, reversed], operands: [...chain.operands, node.left] };
        continues[node.right] = true;
      } else {
        chainOf[index] = { operations: [code], operands: [node.left, node.right] };
      }
    }

    // Columns: sources as given, constants filled once, one output column per pass.
    const columns: (Float64Array | undefined)[] = nodes.map(() => undefined);
    const columnOf = (index: number): Float64Array => {
      let column = columns[index];
      if (column === undefined) {
        const node = nodes[index];
        const constant = constants[index];
        if (node.operation === 'source') column = this.sourceColumns[node.sourceIndex];
        else column = constant === undefined ? new Float64Array(chunkSize) : new Float64Array(chunkSize).fill(constant);
        columns[index] = column;
      }
      return column;
    };
    this.program = [];
    for (let index = 0; index <= outputNode; index += 1) {
      const chain = chainOf[index];
      if (chain === undefined || continues[index]) continue;
      const { operations, operands } = chain;
      this.program.push({
        operations,
        operands: operands.map(columnOf),
        out: columnOf(index),
        operandSigns: operations.map(operandSign),
        runningSigns: operations.map(runningSign),
      });
    }
    // An output that is a source or a constant: one pass that copies it (x + 0 would turn −0 into +0).
    if (this.program.length === 0) {
      this.program.push({
        operations: [],
        operands: [columnOf(outputNode)],
        out: new Float64Array(chunkSize),
        operandSigns: [],
        runningSigns: [],
      });
    }
  }

  /**
   * Runs the program for the first `count` trials of the chunk. With a `target`, the output values go to
   * target[offset … offset + count) and that array is returned; otherwise the output column is returned.
   */
  evaluate(count: number, target?: Float64Array, offset = 0): Float64Array {
    const program = this.program;
    const last = program.length - 1;
    for (let index = 0; index <= last; index += 1) {
      const { operations, operands: x, operandSigns: sign, runningSigns: keep } = program[index];
      const out = index === last && target !== undefined ? target : program[index].out;
      const start = index === last && target !== undefined ? offset : 0;
      const length = operations.length;
      if (length === 0) copy(out, start, x[0], count);
      else if (length === 1) single(operations[0], out, start, x[0], x[1], count);
      else if (length === 2) pair(operations[0], operations[1], out, start, x[0], x[1], x[2], count);
      else if (operations[0] === multiply)
        product(out, start, x[0], x[1], x[2], x[3], length === 4 ? x[4] : undefined, count);
      else if (length === 3)
        signedSumOfThree(out, start, x[0], sign[0], x[1], keep[1], sign[1], x[2], keep[2], sign[2], x[3], count);
      else
        signedSumOfFour(
          out,
          start,
          x[0],
          sign[0],
          x[1],
          keep[1],
          sign[1],
          x[2],
          keep[2],
          sign[2],
          x[3],
          keep[3],
          sign[3],
          x[4],
          count,
        );
    }
    return target ?? program[last].out;
  }
}

/**
 * Whether one loop below carries out this chain: any one or two operations (single, pair), or three or
 * four that are all additions and subtractions (signedSum…) or all multiplications (product).
 */
function isRunnable(operations: number[]): boolean {
  if (operations.length <= 2) return true;
  if (operations.length > longestChain) return false;
  const additive = (code: number) => code === add || code === subtract || code === subtractFrom;
  return operations.every(additive) || operations.every((code) => code === multiply);
}

/** The sign σ of the operand in r ± x or x − r: r + σx or −r + σx, exact in IEEE arithmetic (fl(−r + x) = fl(x − r)). */
function operandSign(operation: number): number {
  return operation === subtract ? -1 : 1;
}

/** The sign ρ of the running value: −1 for x − r, else +1. */
function runningSign(operation: number): number {
  return operation === subtractFrom ? -1 : 1;
}

/** out[start + i] = x₀[i] for i < count. */
function copy(out: Float64Array, start: number, x0: Float64Array, count: number): void {
  for (let i = 0; i < count; i += 1) out[start + i] = x0[i];
}

/** out[start + i] = x₀[i] ∘ x₁[i] for i < count. */
function single(
  operation: number,
  out: Float64Array,
  start: number,
  x0: Float64Array,
  x1: Float64Array,
  count: number,
): void {
  switch (operation) {
    case add:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] + x1[i];
      return;
    case subtract:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] - x1[i];
      return;
    case multiply:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] * x1[i];
      return;
    default:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] / x1[i];
  }
}

/** out[start + i] = (x₀[i] ∘₁ x₁[i]) ∘₂ x₂[i] for i < count: one loop per pair of operations, none dispatched per trial. */
function pair(
  first: number,
  second: number,
  out: Float64Array,
  start: number,
  x0: Float64Array,
  x1: Float64Array,
  x2: Float64Array,
  count: number,
): void {
  switch (6 * first + second) {
    case 6 * add + add:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] + x1[i] + x2[i];
      return;
    case 6 * add + subtract:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] + x1[i] - x2[i];
      return;
    case 6 * add + multiply:
      for (let i = 0; i < count; i += 1) out[start + i] = (x0[i] + x1[i]) * x2[i];
      return;
    case 6 * add + divide:
      for (let i = 0; i < count; i += 1) out[start + i] = (x0[i] + x1[i]) / x2[i];
      return;
    case 6 * add + subtractFrom:
      for (let i = 0; i < count; i += 1) out[start + i] = x2[i] - (x0[i] + x1[i]);
      return;
    case 6 * add + divideInto:
      for (let i = 0; i < count; i += 1) out[start + i] = x2[i] / (x0[i] + x1[i]);
      return;
    case 6 * subtract + add:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] - x1[i] + x2[i];
      return;
    case 6 * subtract + subtract:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] - x1[i] - x2[i];
      return;
    case 6 * subtract + multiply:
      for (let i = 0; i < count; i += 1) out[start + i] = (x0[i] - x1[i]) * x2[i];
      return;
    case 6 * subtract + divide:
      for (let i = 0; i < count; i += 1) out[start + i] = (x0[i] - x1[i]) / x2[i];
      return;
    case 6 * subtract + subtractFrom:
      for (let i = 0; i < count; i += 1) out[start + i] = x2[i] - (x0[i] - x1[i]);
      return;
    case 6 * subtract + divideInto:
      for (let i = 0; i < count; i += 1) out[start + i] = x2[i] / (x0[i] - x1[i]);
      return;
    case 6 * multiply + add:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] * x1[i] + x2[i];
      return;
    case 6 * multiply + subtract:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] * x1[i] - x2[i];
      return;
    case 6 * multiply + multiply:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] * x1[i] * x2[i];
      return;
    case 6 * multiply + divide:
      for (let i = 0; i < count; i += 1) out[start + i] = (x0[i] * x1[i]) / x2[i];
      return;
    case 6 * multiply + subtractFrom:
      for (let i = 0; i < count; i += 1) out[start + i] = x2[i] - x0[i] * x1[i];
      return;
    case 6 * multiply + divideInto:
      for (let i = 0; i < count; i += 1) out[start + i] = x2[i] / (x0[i] * x1[i]);
      return;
    case 6 * divide + add:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] / x1[i] + x2[i];
      return;
    case 6 * divide + subtract:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] / x1[i] - x2[i];
      return;
    case 6 * divide + multiply:
      for (let i = 0; i < count; i += 1) out[start + i] = (x0[i] / x1[i]) * x2[i];
      return;
    case 6 * divide + divide:
      for (let i = 0; i < count; i += 1) out[start + i] = x0[i] / x1[i] / x2[i];
      return;
    case 6 * divide + subtractFrom:
      for (let i = 0; i < count; i += 1) out[start + i] = x2[i] - x0[i] / x1[i];
      return;
    default:
      for (let i = 0; i < count; i += 1) out[start + i] = x2[i] / (x0[i] / x1[i]);
  }
}

/** out[start + i] = ρ₃(ρ₂(x₀ + σ₁x₁) + σ₂x₂) + σ₃x₃ at trial i, for i < count (ρ, σ = ±1: see operandSign, runningSign). */
function signedSumOfThree(
  out: Float64Array,
  start: number,
  x0: Float64Array,
  sign1: number,
  x1: Float64Array,
  keep2: number,
  sign2: number,
  x2: Float64Array,
  keep3: number,
  sign3: number,
  x3: Float64Array,
  count: number,
): void {
  for (let i = 0; i < count; i += 1)
    out[start + i] = keep3 * (keep2 * (x0[i] + sign1 * x1[i]) + sign2 * x2[i]) + sign3 * x3[i];
}

/** As signedSumOfThree with a fourth operation ρ₄(…) + σ₄x₄. */
function signedSumOfFour(
  out: Float64Array,
  start: number,
  x0: Float64Array,
  sign1: number,
  x1: Float64Array,
  keep2: number,
  sign2: number,
  x2: Float64Array,
  keep3: number,
  sign3: number,
  x3: Float64Array,
  keep4: number,
  sign4: number,
  x4: Float64Array,
  count: number,
): void {
  for (let i = 0; i < count; i += 1) {
    out[start + i] =
      keep4 * (keep3 * (keep2 * (x0[i] + sign1 * x1[i]) + sign2 * x2[i]) + sign3 * x3[i]) + sign4 * x4[i];
  }
}

/** out[start + i] = x₀x₁x₂x₃ (·x₄ when given) at trial i, multiplied left to right, for i < count. */
function product(
  out: Float64Array,
  start: number,
  x0: Float64Array,
  x1: Float64Array,
  x2: Float64Array,
  x3: Float64Array,
  x4: Float64Array | undefined,
  count: number,
): void {
  if (x4 === undefined) for (let i = 0; i < count; i += 1) out[start + i] = x0[i] * x1[i] * x2[i] * x3[i];
  else for (let i = 0; i < count; i += 1) out[start + i] = x0[i] * x1[i] * x2[i] * x3[i] * x4[i];
}

/** r ∘ x for an operation code (used once per constant operation, when folding). */
function combine(operation: number, running: number, operand: number): number {
  if (operation === add) return running + operand;
  if (operation === subtract) return running - operand;
  if (operation === multiply) return running * operand;
  return running / operand;
}
