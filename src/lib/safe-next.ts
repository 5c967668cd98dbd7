// Where to go after signing in. Only same-site relative paths are followed, so a crafted link like
// /sign-in?next=//evil.example or ?next=https://evil.example cannot send someone off-site (open redirect).

const PROBE_ORIGIN = 'https://drabyard.invalid';
const MAX_LENGTH = 2048;

export function safeNext(raw: string | null | undefined, fallback = '/account'): string {
  if (typeof raw !== 'string' || raw.length === 0 || raw.length > MAX_LENGTH) return fallback;
  // Must be a path: one leading slash, and not '//' or '/\' (browsers read a backslash as a slash).
  if (raw[0] !== '/' || raw[1] === '/' || raw[1] === '\\') return fallback;
  // Browsers strip tabs and newlines from URLs ('/\t/evil' becomes '//evil'); refuse any control character.
  if (/[\u0000-\u001f\u007f\\]/.test(raw)) return fallback;

  let url: URL;
  try {
    url = new URL(raw, PROBE_ORIGIN);
  } catch {
    return fallback;
  }
  if (url.origin !== PROBE_ORIGIN) return fallback;
  // Going back to the sign-in page would loop.
  if (url.pathname === '/sign-in') return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}
