// Test card numbers and the outcome each produces. The numbers and decline codes are Stripe's
// published test cards, so code written against the stand-in behaves the same against Stripe's
// test mode. source: Stripe docs "Testing" (test card numbers), from memory.
import { createHash } from 'node:crypto';
import type { CardDetails } from './types';

export interface CardInput {
  number: string;
  expiry?: string;
  cvc?: string;
}

export interface CardDecline {
  code: string;
  declineCode?: string;
  message: string;
}

interface TestCard {
  brand: string;
  funding: string;
  decline?: CardDecline;
}

const DECLINED = 'Your card was declined.';

export const TEST_CARDS: Record<string, TestCard> = {
  '4242424242424242': { brand: 'visa', funding: 'credit' },
  '4000056655665556': { brand: 'visa', funding: 'debit' },
  '5555555555554444': { brand: 'mastercard', funding: 'credit' },
  '378282246310005': { brand: 'amex', funding: 'credit' },
  '4000000000000077': { brand: 'visa', funding: 'credit' },
  '4000000000000002': { brand: 'visa', funding: 'credit', decline: { code: 'card_declined', declineCode: 'generic_decline', message: DECLINED } },
  '4000000000009995': {
    brand: 'visa',
    funding: 'credit',
    decline: { code: 'card_declined', declineCode: 'insufficient_funds', message: 'Your card has insufficient funds.' },
  },
  '4000000000009987': { brand: 'visa', funding: 'credit', decline: { code: 'card_declined', declineCode: 'lost_card', message: DECLINED } },
  '4000000000000069': { brand: 'visa', funding: 'credit', decline: { code: 'expired_card', message: 'Your card has expired.' } },
  '4000000000000127': { brand: 'visa', funding: 'credit', decline: { code: 'incorrect_cvc', message: "Your card's security code is incorrect." } },
  '4000000000000119': {
    brand: 'visa',
    funding: 'credit',
    decline: { code: 'processing_error', message: 'An error occurred while processing your card. Try again in a little bit.' },
  },
};

export type CardCheck =
  | { ok: true; card: CardDetails; decline?: CardDecline }
  | { ok: false; error: CardDecline };

/** Validates what a payer typed; a well-formed card may still be declined (`decline`). */
export function checkCard(input: CardInput, now = new Date()): CardCheck {
  const number = input.number.replace(/[\s-]/g, '');
  if (!/^\d{12,19}$/.test(number) || !luhnValid(number)) {
    return { ok: false, error: { code: 'incorrect_number', message: 'Your card number is incorrect.' } };
  }
  const expiry = parseExpiry(input.expiry ?? defaultExpiry(now));
  if (!expiry) return { ok: false, error: { code: 'invalid_expiry_month', message: "Your card's expiration date is incomplete or invalid." } };
  const endOfMonth = new Date(Date.UTC(expiry.year, expiry.month, 1));
  if (endOfMonth.getTime() <= now.getTime()) {
    return { ok: false, error: { code: 'invalid_expiry_year', message: "Your card's expiration date is in the past." } };
  }
  const known = TEST_CARDS[number];
  const brand = known?.brand ?? brandOf(number);
  const cvc = (input.cvc ?? (brand === 'amex' ? '1234' : '123')).trim();
  if (!/^\d{3,4}$/.test(cvc)) return { ok: false, error: { code: 'invalid_cvc', message: "Your card's security code is invalid." } };

  const card: CardDetails = {
    brand,
    country: 'US',
    exp_month: expiry.month,
    exp_year: expiry.year,
    fingerprint: createHash('sha256').update(number).digest('base64url').slice(0, 16),
    funding: known?.funding ?? 'credit',
    last4: number.slice(-4),
  };
  if (!known) {
    return {
      ok: true,
      card,
      decline: {
        code: 'card_declined',
        declineCode: 'test_mode_live_card',
        message: 'Your card was declined. Your request was in test mode, but used a non test card. Use one of the test cards listed on the page.',
      },
    };
  }
  return { ok: true, card, ...(known.decline ? { decline: known.decline } : {}) };
}

export function luhnValid(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i += 1) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      d *= 2;
      if (d > 9) d -= 9;
    }
    sum += d;
  }
  return sum % 10 === 0;
}

function brandOf(number: string): string {
  if (number.startsWith('4')) return 'visa';
  if (/^(5[1-5]|2[2-7])/.test(number)) return 'mastercard';
  if (/^3[47]/.test(number)) return 'amex';
  return 'unknown';
}

/** Accepts `MM/YY`, `MM / YY`, `MMYY`, `MM/YYYY`. */
export function parseExpiry(text: string): { month: number; year: number } | null {
  const m = /^\s*(\d{1,2})\s*\/?\s*(\d{2}|\d{4})\s*$/.exec(text);
  if (!m) return null;
  const month = Number(m[1]);
  const year = m[2].length === 2 ? 2000 + Number(m[2]) : Number(m[2]);
  if (month < 1 || month > 12) return null;
  return { month, year };
}

function defaultExpiry(now: Date): string {
  return `12/${String((now.getUTCFullYear() + 5) % 100).padStart(2, '0')}`;
}
