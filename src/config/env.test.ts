import { describe, expect, it } from 'vitest';
import { parseClientEnv } from './env';

describe('parseClientEnv', () => {
  it('when nothing is set, then the API is same-origin', () => {
    expect(parseClientEnv({}).VITE_API_BASE_URL).toBe('');
  });

  it('when other VITE_ variables are present, then they are not passed on', () => {
    const env = parseClientEnv({ VITE_API_BASE_URL: '/backend', VITE_SECRET_TOKEN: 'oops', MODE: 'test' });
    expect(env).toEqual({ MODE: 'test', DEV: false, VITE_API_BASE_URL: '/backend' });
  });

  it.each(['https://api.example.test', '//api.example.test', '/backend/'])(
    'when VITE_API_BASE_URL is %j, then start-up fails with a clear message',
    (value) => {
      expect(() => parseClientEnv({ VITE_API_BASE_URL: value })).toThrow(/Invalid client environment: VITE_API_BASE_URL/);
    },
  );
});
