import { describe, expect, it } from 'vitest';
import { ColumnEvaluator } from './column-evaluator';
import type { CompiledModel, SourceDefinition, TapeNode } from './model-types';
import { RandomGenerator } from './random-generator';

const operations = ['add', 'subtract', 'multiply', 'divide'] as const;

/** A model of `sourceCount` sources over the given tape (the evaluator reads only the tape and the number of sources). */
function modelOf(nodes: TapeNode[], sourceCount: number, outputNode = nodes.length - 1): CompiledModel {
  const source: SourceDefinition = {
    id: 'x',
    label: 'x',
    category: 'userDefined',
    estimate: 0,
    unit: '1',
    distribution: { shape: 'normal', standardUncertainty: 1 },
    standardUncertainty: 1,
    degreesOfFreedom: Infinity,
    evaluationType: 'B',
    sharing: 'use',
    stepIndices: [0],
  };
  return {
    modelFormat: 'dilutrace-model/1',
    sources: Array.from({ length: sourceCount }, () => source),
    nodes,
    outputNode,
    outputUnit: '1',
    measurand: 'Y',
    checkpoints: [],
    warnings: [],
  };
}

/** The definition: the tape evaluated node by node for one trial, in plain IEEE double arithmetic. */
function evaluateNodeByNode(nodes: TapeNode[], outputNode: number, sourceValues: number[]): number {
  const values: number[] = [];
  nodes.forEach((node, index) => {
    if (node.operation === 'source') values[index] = sourceValues[node.sourceIndex];
    else if (node.operation === 'constant') values[index] = node.value;
    else {
      const [left, right] = [values[node.left], values[node.right]];
      values[index] =
        node.operation === 'add'
          ? left + right
          : node.operation === 'subtract'
            ? left - right
            : node.operation === 'multiply'
              ? left * right
              : left / right;
    }
  });
  return values[outputNode];
}

/** A random tape: sources and constants (with ±0 among them), then operations that mostly read the node just before, on either side, so chains of every kind and length occur. */
function randomTape(random: RandomGenerator, sourceCount: number, operationCount: number): TapeNode[] {
  const nodes: TapeNode[] = [];
  for (let index = 0; index < sourceCount; index += 1) nodes.push({ operation: 'source', sourceIndex: index });
  for (const value of [0, -0, 1, -2.5, 1000, 3]) nodes.push({ operation: 'constant', value });
  const pick = () => Math.floor(random.nextUniform() * nodes.length);
  for (let index = 0; index < operationCount; index += 1) {
    const operation = operations[Math.floor(random.nextUniform() * 4)];
    const previous = nodes.length - 1;
    const other = pick();
    const [left, right] = random.nextUniform() < 0.5 ? [previous, other] : [other, previous];
    nodes.push({ operation, left: random.nextUniform() < 0.1 ? pick() : left, right });
  }
  return nodes;
}

describe('ColumnEvaluator (compiled chains) against the tape evaluated node by node', () => {
  // Exact agreement (Object.is, so −0 and NaN count): the program only regroups passes, never the arithmetic.
  it('gives bit-identical results on random tapes, for chunks of any length', () => {
    const random = new RandomGenerator(2024);
    for (let model = 0; model < 200; model += 1) {
      const sourceCount = 1 + Math.floor(random.nextUniform() * 5);
      const nodes = randomTape(random, sourceCount, 1 + Math.floor(random.nextUniform() * 14));
      const outputNode =
        random.nextUniform() < 0.9 ? nodes.length - 1 : Math.floor(random.nextUniform() * nodes.length);
      const chunkSize = 7;
      const evaluator = new ColumnEvaluator(modelOf(nodes, sourceCount, outputNode), chunkSize);
      const trials = Array.from({ length: chunkSize }, (_, trial) =>
        Array.from({ length: sourceCount }, () =>
          trial === 0
            ? 0
            : trial === 1
              ? -0
              : (random.nextUniform() - 0.5) * 10 ** Math.floor(random.nextUniform() * 6),
        ),
      );
      trials.forEach((values, trial) =>
        values.forEach((value, source) => (evaluator.sourceColumns[source][trial] = value)),
      );
      const count = 1 + Math.floor(random.nextUniform() * chunkSize);
      const target = new Float64Array(count + 3);
      evaluator.evaluate(count, target, 3);
      const returned = evaluator.evaluate(count);
      for (let trial = 0; trial < count; trial += 1) {
        const expected = evaluateNodeByNode(nodes, outputNode, trials[trial]);
        expect(
          Object.is(target[3 + trial], expected),
          `model ${model}, trial ${trial}: ${target[3 + trial]} vs ${expected}`,
        ).toBe(true);
        expect(Object.is(returned[trial], expected)).toBe(true);
      }
    }
  });

  it('copies an output that is a source or a constant, −0 included', () => {
    const nodes: TapeNode[] = [
      { operation: 'source', sourceIndex: 0 },
      { operation: 'constant', value: -0 },
    ];
    const fromSource = new ColumnEvaluator(modelOf(nodes, 1, 0), 4);
    fromSource.sourceColumns[0].set([-0, 1, 2, 3]);
    expect(Array.from(fromSource.evaluate(4))).toEqual([-0, 1, 2, 3]);
    expect(Object.is(new ColumnEvaluator(modelOf(nodes, 1, 1), 4).evaluate(2)[0], -0)).toBe(true);
  });
});
