import { describe, expect, it } from 'vitest';
import { canonicalForm, parseFormEncoded } from './form-encoding';
import { checkParams, EXPAND, arr, int, metadata, mergeMetadata, obj, str } from './params';
import { StripeFakeError } from './stripe-error';

const plain = (value: unknown): unknown => JSON.parse(JSON.stringify(value));

describe('parseFormEncoded', () => {
  it('when keys are bracketed, then hashes nest and indexed keys become numbered entries', () => {
    const parsed = parseFormEncoded(
      'mode=payment&line_items[0][price_data][currency]=usd&line_items[0][quantity]=2&line_items[1][quantity]=1&metadata[order_id]=ord%201',
    );
    expect(plain(parsed)).toEqual({
      mode: 'payment',
      line_items: { '0': { price_data: { currency: 'usd' }, quantity: '2' }, '1': { quantity: '1' } },
      metadata: { order_id: 'ord 1' },
    });
  });

  it('when `a[]` repeats or brackets are percent-encoded, then values append in order', () => {
    expect(plain(parseFormEncoded('expand[]=payment_intent&expand%5B%5D=line_items'))).toEqual({ expand: { '0': 'payment_intent', '1': 'line_items' } });
  });

  it('when a key is both a value and a hash, then a Stripe error is raised', () => {
    expect(() => parseFormEncoded('a=1&a[b]=2')).toThrow(StripeFakeError);
    expect(() => parseFormEncoded('a]b=1')).toThrow(/Invalid parameter name/);
  });

  it('when a key is __proto__, then it stays a plain key and pollutes nothing', () => {
    const parsed = parseFormEncoded('metadata[__proto__]=x');
    expect(Object.keys(parsed.metadata as object)).toEqual(['__proto__']);
    expect(({} as Record<string, unknown>).x).toBeUndefined();
  });

  it('when two bodies differ only in order, then their canonical forms match', () => {
    expect(canonicalForm(parseFormEncoded('a=1&b[c]=2&b[d]=3'))).toBe(canonicalForm(parseFormEncoded('b[d]=3&a=1&b[c]=2')));
  });
});

describe('checkParams', () => {
  const spec = { amount: int({ required: true, min: 1 }), items: arr(obj({ name: str({ required: true }) })), metadata: metadata(), expand: EXPAND };

  it('when params fit the spec, then typed values come back with arrays in index order', () => {
    const out = checkParams(parseFormEncoded('amount=500&items[1][name]=b&items[0][name]=a&expand[0]=x'), spec);
    expect(out).toEqual({ amount: 500, items: [{ name: 'a' }, { name: 'b' }], expand: ['x'] });
  });

  it('when a param is missing, unknown or malformed, then the error names the bracketed path', () => {
    const attempt = (raw: string): unknown => {
      try {
        checkParams(parseFormEncoded(raw), spec);
        return undefined;
      } catch (err) {
        return (err as StripeFakeError).body;
      }
    };
    expect(attempt('')).toMatchObject({ code: 'parameter_missing', param: 'amount' });
    expect(attempt('amount=5&colour=red')).toMatchObject({ code: 'parameter_unknown', param: 'colour' });
    expect(attempt('amount=five')).toMatchObject({ code: 'parameter_invalid_integer', param: 'amount' });
    expect(attempt('amount=0')).toMatchObject({ param: 'amount', message: 'This value must be greater than or equal to 1.' });
    expect(attempt('amount=5&items[0][size]=9')).toMatchObject({ code: 'parameter_unknown', param: 'items[0][size]' });
    expect(attempt('amount=5&items[0][name]=')).toMatchObject({ param: 'items[0][name]' });
    expect(attempt(`amount=5&metadata[${'k'.repeat(41)}]=v`)).toMatchObject({ param: `metadata[${'k'.repeat(41)}]` });
  });

  it('when metadata is updated, then keys merge and an empty value removes a key', () => {
    expect(mergeMetadata({ a: '1', b: '2' }, { b: '', c: '3' })).toEqual({ a: '1', c: '3' });
    expect(mergeMetadata({ a: '1' }, undefined)).toEqual({ a: '1' });
  });
});
