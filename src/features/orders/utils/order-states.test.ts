import { describe, expect, it } from 'vitest';
import { subOrderSteps } from './order-states';

const base = { pickup: false, shippedAt: null, deliveredAt: null, carrier: null, tracking: null } as const;
const statuses = (steps: ReturnType<typeof subOrderSteps>) => steps.map((s) => `${s.key}:${s.status}`);

describe('sub-order steps', () => {
  it('when paid, then paid is where it stands and shipped and delivered are to come', () => {
    expect(statuses(subOrderSteps({ ...base, state: 'paid' }))).toEqual(['paid:current', 'shipped:upcoming', 'delivered:upcoming']);
  });

  it('when shipped, then the shipped step carries the carrier and tracking number', () => {
    const steps = subOrderSteps({ ...base, state: 'shipped', shippedAt: '2026-03-02T10:00:00Z', carrier: 'UPS', tracking: '1Z 999 AA1' });
    expect(statuses(steps)).toEqual(['paid:done', 'shipped:current', 'delivered:upcoming']);
    expect(steps[1].detail).toBe('UPS · 1Z 999 AA1');
  });

  it('when a pickup is handed over, then there is no shipping step', () => {
    expect(statuses(subOrderSteps({ ...base, pickup: true, state: 'delivered', deliveredAt: '2026-03-03T10:00:00Z' }))).toEqual(['paid:done', 'delivered:current']);
  });

  it('when refunded after shipping, then the steps reached stay done and the refund is the stop', () => {
    expect(statuses(subOrderSteps({ ...base, state: 'refunded', shippedAt: '2026-03-02T10:00:00Z', carrier: 'UPS', tracking: '1Z' }))).toEqual([
      'paid:done',
      'shipped:done',
      'delivered:upcoming',
      'refunded:stopped',
    ]);
  });

  it('when a checkout was cancelled before payment, then nothing is done and it stopped at cancelled', () => {
    const steps = subOrderSteps({ ...base, state: 'cancelled' });
    expect(statuses(steps)).toEqual(['paid:upcoming', 'shipped:upcoming', 'delivered:upcoming', 'cancelled:stopped']);
    expect(steps[0].label).toBe('Not paid');
  });
});
