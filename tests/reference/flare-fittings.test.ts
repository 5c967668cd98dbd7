// Checks against /work/shared/REFERENCES.md, "Inverted 45-degree flare fittings — SAE J512, flares per SAE J533".
import { describe, expect, it } from 'vitest';
import { FLARE_ANGLE_DEG, INVERTED_FLARE_TUBE_FLARE, invertedFlareNutThread } from '../../server/domain/standards/flare-fittings';
import { derivedSpecs } from '../../server/domain/standards/part-specs';

describe('Inverted flare nut threads against SAE J512', () => {
  it('when 3/16 in tube is looked up, then the nut thread is 3/8-24, confirmed (source: SAE J512, two pages)', () => {
    // source: SAE J512 via REFERENCES.md — confirmed on two pages.
    expect(invertedFlareNutThread('3/16')).toMatchObject({ nutThread: '3/8-24', confirmation: 'confirmed' });
  });

  it('when 1/4 in tube is looked up, then the nut thread is 7/16-24, confirmed (source: SAE J512)', () => {
    // source: SAE J512 via REFERENCES.md — confirmed.
    expect(invertedFlareNutThread('1/4')).toMatchObject({ nutThread: '7/16-24', confirmation: 'confirmed' });
  });

  it('when 5/16 in tube is looked up, then 1/2-20 is given as partly confirmed (source: SAE J512, pairing from memory)', () => {
    // source: SAE J512 via REFERENCES.md — partly confirmed: thread series seen, pairing from memory.
    const r = invertedFlareNutThread('5/16')!;
    expect(r).toMatchObject({ nutThread: '1/2-20', confirmation: 'partly_confirmed' });
    expect(r.note).toMatch(/partly confirmed/);
  });

  it('when 3/8 in tube is looked up, then 5/8-18 is given as partly confirmed (source: SAE J512, pairing from memory)', () => {
    // source: SAE J512 via REFERENCES.md — partly confirmed: thread series seen, pairing from memory.
    expect(invertedFlareNutThread('3/8')).toMatchObject({ nutThread: '5/8-18', confirmation: 'partly_confirmed' });
  });

  it('when the flare facts are read, then the angle is 45 degrees and seats assume a double flare (source: SAE J512 scope)', () => {
    // source: SAE J512 / J533 via REFERENCES.md — flare angle 45 degrees; inverted seats assume double-flared tubing.
    expect(FLARE_ANGLE_DEG).toBe(45);
    expect(INVERTED_FLARE_TUBE_FLARE).toBe('double');
  });

  it('when a brake line page is derived, then the flare facts name SAE J512 and no torque is given', () => {
    // source: REFERENCES.md "Flare nut tightening" — no authoritative torque exists, so none may be presented.
    const d = derivedSpecs('brake_line', { tubeOdIn: '3/16', lengthIn: 40, flare: 'double_inverted' });
    expect(d.find((x) => x.key === 'flareNutThread')!.source).toMatch(/SAE J512/);
    expect(d.some((x) => /torque/i.test(x.key + x.label))).toBe(false);
  });
});
