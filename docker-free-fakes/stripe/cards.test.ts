import { describe, expect, it } from 'vitest';
import { checkCard, luhnValid, parseExpiry } from './cards';

const NOW = new Date('2026-03-15T12:00:00Z');

describe('checkCard', () => {
  it('when 4242 4242 4242 4242 is given, then it is a valid visa that is not declined', () => {
    const result = checkCard({ number: '4242 4242 4242 4242', expiry: '04/27', cvc: '123' }, NOW);
    expect(result).toMatchObject({ ok: true, card: { brand: 'visa', last4: '4242', exp_month: 4, exp_year: 2027 } });
    expect(result.ok && result.decline).toBeUndefined();
  });

  it('when 4000 0000 0000 0002 is given, then it is declined with generic_decline', () => {
    expect(checkCard({ number: '4000000000000002', expiry: '12/30', cvc: '123' }, NOW)).toMatchObject({
      ok: true,
      decline: { code: 'card_declined', declineCode: 'generic_decline' },
    });
  });

  it('when the number fails the Luhn check, the expiry is past or the CVC is short, then the card is rejected', () => {
    expect(checkCard({ number: '4242424242424241', expiry: '12/30', cvc: '123' }, NOW)).toMatchObject({ ok: false, error: { code: 'incorrect_number' } });
    expect(checkCard({ number: '4242424242424242', expiry: '02/26', cvc: '123' }, NOW)).toMatchObject({ ok: false, error: { code: 'invalid_expiry_year' } });
    expect(checkCard({ number: '4242424242424242', expiry: '13/30', cvc: '123' }, NOW)).toMatchObject({ ok: false, error: { code: 'invalid_expiry_month' } });
    expect(checkCard({ number: '4242424242424242', expiry: '12/30', cvc: '12' }, NOW)).toMatchObject({ ok: false, error: { code: 'invalid_cvc' } });
  });

  it('when a Luhn-valid number is not a test card, then it is declined as a non-test card', () => {
    expect(checkCard({ number: '4111111111111111', expiry: '12/30', cvc: '123' }, NOW)).toMatchObject({
      ok: true,
      decline: { declineCode: 'test_mode_live_card' },
    });
  });

  it('when the expiry month is the current month, then the card is still valid', () => {
    expect(checkCard({ number: '4242424242424242', expiry: '03/26', cvc: '123' }, NOW).ok).toBe(true);
  });
});

describe('parseExpiry and luhnValid', () => {
  it('when expiry is written in the usual ways, then month and year are read', () => {
    expect(parseExpiry('12 / 34')).toEqual({ month: 12, year: 2034 });
    expect(parseExpiry('1/2031')).toEqual({ month: 1, year: 2031 });
    expect(parseExpiry('0434')).toEqual({ month: 4, year: 2034 });
    expect(parseExpiry('tomorrow')).toBeNull();
  });

  it('when published test numbers are checked, then they pass Luhn', () => {
    for (const n of ['4242424242424242', '4000000000000002', '5555555555554444', '378282246310005']) expect(luhnValid(n)).toBe(true);
  });
});
