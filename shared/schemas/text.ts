/** Control and format characters (NUL, escapes, zero-width marks) carry no meaning in a typed query: they become spaces. */
export const cleanQueryText = (s: string) => s.replace(/[\p{Cc}\p{Cf}\p{Cs}]/gu, ' ').trim();
