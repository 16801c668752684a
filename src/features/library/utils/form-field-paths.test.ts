import { describe, expect, it } from 'vitest';
import { formFieldPaths } from './form-field-paths';

describe('formFieldPaths', () => {
  it('names nested fields, array items and the groups themselves', () => {
    const values = {
      data: { code: 'PP-10', points: [{ volumeUl: 10, randomErrorUl: 0.08 }], calibratedOn: null },
      reason: '',
    };
    expect(formFieldPaths(values)).toEqual([
      'data',
      'data.code',
      'data.points',
      'data.points.0',
      'data.points.0.volumeUl',
      'data.points.0.randomErrorUl',
      'data.calibratedOn',
      'reason',
    ]);
  });
});
