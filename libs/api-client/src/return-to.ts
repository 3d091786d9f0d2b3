/**
 * Accepts a `returnTo` value only when it is a path on this origin ("/admin/members"), so a
 * crafted sign-in link cannot send the user elsewhere. Anything else gives null.
 */
export function safeReturnTo(value: string | null | undefined): string | null {
  if (!value || value.length > 2000) return null;
  if (!value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return null;
  if (/[\u0000-\u001f\\]/.test(value)) return null;
  try {
    const base = 'http://origin.invalid';
    const url = new URL(value, base);
    if (url.origin !== base) return null;
    return url.pathname + url.search + url.hash;
  } catch {
    return null;
  }
}
