import { describe, expect, it } from 'vitest';
import { safeNext } from './safe-next';

describe('safeNext', () => {
  it.each([
    ['/account', '/account'],
    ['/garage/vehicles/7?tab=teardown#brakes', '/garage/vehicles/7?tab=teardown#brakes'],
    ['/search?q=7373-00-123-4567', '/search?q=7373-00-123-4567'],
    ['/catalog/../orders', '/orders'],
  ])('when next is the same-site path %s, then it is followed as %s', (raw, expected) => {
    expect(safeNext(raw)).toBe(expected);
  });

  it.each([
    ['//evil.example/path'],
    ['/\\evil.example'],
    ['/\t/evil.example'],
    ['/\n/evil.example'],
    ['https://evil.example/'],
    ['HTTPS://evil.example'],
    ['javascript:alert(1)'],
    ['data:text/html,hi'],
    ['evil.example'],
    ['account'],
    [' /account'],
    ['\\\\evil.example'],
    [''],
  ])('when next is %j, then the fallback is used', (raw) => {
    expect(safeNext(raw)).toBe('/account');
  });

  it('when next is missing, then the default fallback /account is used', () => {
    expect(safeNext(null)).toBe('/account');
    expect(safeNext(undefined)).toBe('/account');
  });

  it('when a fallback is given, then it replaces the default', () => {
    expect(safeNext('//evil.example', '/')).toBe('/');
  });

  it('when next points back at the sign-in page, then the fallback is used (no loop)', () => {
    expect(safeNext('/sign-in?next=/account')).toBe('/account');
  });

  it('when next is absurdly long, then the fallback is used', () => {
    expect(safeNext(`/${'a'.repeat(5000)}`)).toBe('/account');
  });
});
