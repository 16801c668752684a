import { describe, expect, it } from 'vitest';
import { idFromParam } from './route-params';

describe('idFromParam', () => {
  it('reads a whole number above zero, and nothing else', () => {
    expect(idFromParam('12')).toBe(12);
    for (const text of [undefined, '', '0', '-3', '1.5', '12abc', 'NaN', 'Infinity'])
      expect(idFromParam(text), String(text)).toBeNull();
  });
});
