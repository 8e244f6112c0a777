import { describe, expect, it } from 'vitest';
import type { ReferenceData } from '../../api/types';
import { demoHouseBHeating } from '../../test/estimate-fixtures';
import { coveringOf, minimumUnitCount, sourceWord } from './heating-display';

const referenceData = {
  coverings: {
    title: 'Coverings',
    description: 'test rows',
    rows: [
      { id: 'poly-double', label: 'Double polyethylene', layers: 2, source: 'test', confidence: 'memory' },
      { id: 'panel-five', label: 'Five-wall panel', layers: 5, source: 'test', confidence: 'memory' },
      { id: 'no-layers', label: 'Unlayered sheet', source: 'test', confidence: 'memory' },
    ],
  },
} as unknown as ReferenceData;

describe('sourceWord', () => {
  it('says where a condition came from in the reader’s words, not the API’s', () => {
    expect(sourceWord('request')).toBe('typed here');
    expect(sourceWord('reference data')).toBe('default');
    expect(sourceWord('house night setpoint')).toBe('night setpoint');
  });
});

describe('coveringOf', () => {
  it('names a covering and its layers', () => {
    expect(coveringOf(referenceData, 'poly-double')).toEqual({ label: 'Double polyethylene', layers: 'double layer' });
    expect(coveringOf(referenceData, 'panel-five')).toEqual({ label: 'Five-wall panel', layers: '5 layers' });
  });

  it('leaves the layers out where the row does not give them, and falls back to the id for an unknown covering', () => {
    expect(coveringOf(referenceData, 'no-layers')).toEqual({ label: 'Unlayered sheet', layers: null });
    expect(coveringOf(undefined, 'glass-single')).toEqual({ label: 'glass-single', layers: null });
  });
});

describe('minimumUnitCount', () => {
  it('takes the count from the estimate’s assumption', () => {
    const three = {
      ...demoHouseBHeating,
      assumptions: demoHouseBHeating.assumptions.map((assumption) =>
        assumption.key === 'heater.minimumUnitCount' ? { ...assumption, value: 3 } : assumption,
      ),
    };
    expect(minimumUnitCount(three)).toBe(3);
  });

  it('falls back to two units when the assumption is missing or not a count', () => {
    const without = { ...demoHouseBHeating, assumptions: [] };
    expect(minimumUnitCount(without)).toBe(2);
    const text = {
      ...demoHouseBHeating,
      assumptions: demoHouseBHeating.assumptions.map((assumption) =>
        assumption.key === 'heater.minimumUnitCount' ? { ...assumption, value: 'two' } : assumption,
      ),
    };
    expect(minimumUnitCount(text)).toBe(2);
  });
});
