import { describe, expect, it } from 'vitest';
import { valuesOf } from './vocabulary';

describe(valuesOf.name, () => {
  it('lists the values of a labelled vocabulary in the order they are written', () => {
    expect(valuesOf({ TRENCH: 'Trench', CORE: 'Core', LAKE: 'Lake' })).toEqual(['TRENCH', 'CORE', 'LAKE']);
  });
});
