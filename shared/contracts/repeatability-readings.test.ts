import { describe, expect, it } from 'vitest';
import { toEngineEquipment } from './engine-equipment';
import { balanceDataSchema, type EquipmentItem } from './library';

// A balance may carry the number of readings behind its repeatability s (Type A, ν = n − 1, JCGM 100:2008 4.2.6).
describe('the readings behind a balance’s repeatability, from library to engine', () => {
  it('comes from the library item, where an item saved before it existed reads as not given', () => {
    const stored = {
      code: 'B-01',
      description: '',
      certificateReference: '',
      capacityG: 220,
      readabilityG: 0.0001,
      repeatabilityG: 0.00005,
      linearityG: 0.0002,
      sensitivityRelativeExpanded: 0.00002,
      sensitivityCoverageFactor: 2,
      calibratedOn: null,
      calibrationDueOn: null,
    };
    const item = (data: unknown) =>
      ({ id: 1, kind: 'balance', code: 'B-01', current: { id: 2, data } }) as unknown as EquipmentItem;
    const old = balanceDataSchema.parse(stored);
    expect(old.repeatabilityReadings).toBeNull();
    expect(toEngineEquipment(item(old))).not.toHaveProperty('repeatabilityReadings', expect.anything());
    const withReadings = balanceDataSchema.parse({ ...stored, repeatabilityReadings: 10 });
    expect(toEngineEquipment(item(withReadings))).toMatchObject({ kind: 'balance', repeatabilityReadings: 10 });
    expect(() => balanceDataSchema.parse({ ...stored, repeatabilityReadings: 1 })).toThrow(/at least 2 readings/);
  });
});
