// source: SAE J512 inverted 45-degree flare nut threads, via ../shared REFERENCES.md; 5/16 and 3/8 in pairings are partly confirmed (tests/reference/flare-fittings.test.ts checks the rows).
import { describe, expect, it } from 'vitest';
import { invertedFlareNutThread, nominalTubeOd, TUBE_OD_TOLERANCE_IN } from './flare-fittings';

describe('invertedFlareNutThread', () => {
  it('when the tube OD is typed as a fraction, decimal or with a unit, then it finds the row', () => {
    for (const v of ['3/16', 0.1875, '3/16 in', '3/16"', '0.1875']) expect(invertedFlareNutThread(v)?.nutThread, String(v)).toBe('3/8-24');
  });

  it('when a measured OD is within the tolerance, then it matches the nominal size', () => {
    expect(invertedFlareNutThread(0.188)?.tubeOd).toBe('3/16');
    expect(invertedFlareNutThread(0.25 - TUBE_OD_TOLERANCE_IN)?.tubeOd).toBe('1/4');
  });

  it('when a measured OD is outside the tolerance of every size, then there is no row', () => {
    expect(invertedFlareNutThread(0.21)).toBeNull();
    expect(invertedFlareNutThread('1/2')).toBeNull();
    expect(invertedFlareNutThread('garbage')).toBeNull();
  });

  it('when a nominal OD is asked, then table sizes snap and others print as a fraction', () => {
    expect(nominalTubeOd(0.1876)).toBe('3/16');
    expect(nominalTubeOd('1/2')).toBe('1/2');
    expect(nominalTubeOd('x')).toBeNull();
  });
});
