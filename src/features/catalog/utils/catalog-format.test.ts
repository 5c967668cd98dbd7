import { describe, expect, it } from 'vitest';
import { applicabilityText, compareCallouts } from './catalog-format';

const none = { serialFrom: null, serialTo: null, builtFrom: null, builtTo: null, variants: null };

describe('catalog formatting', () => {
  it('when a line has no limits, then it applies to all', () => {
    expect(applicabilityText(none)).toBe('All');
  });

  it('when a line has a serial range, a build date and a variant, then all three are said', () => {
    expect(applicabilityText({ ...none, serialFrom: 1001, serialTo: 4999, builtFrom: '1953-06', variants: ['W'] })).toBe(
      'Serials 1,001–4,999 · built from 1953-06 · variant W',
    );
    expect(applicabilityText({ ...none, builtTo: '1952' })).toBe('Built up to 1952');
  });

  it('when callouts are sorted, then numbers sort as numbers', () => {
    expect(['10', '2', '4A', '4', '1'].sort(compareCallouts)).toEqual(['1', '2', '4', '4A', '10']);
  });
});
