/**
 * Where to send someone after sign-in: only a path on this site. Anything that a browser could read as
 * another host (`//evil.example`, `/\evil.example`, `https://…`, control characters) is refused, which
 * is what closes the open redirect.
 */
export function safeReturnTo(value: unknown): string | undefined {
  if (value === undefined || value === '') return '/';
  if (typeof value !== 'string' || value.length > 2000) return undefined;
  if (!value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return undefined;
  if (/[\u0000-\u001f\u007f\\]/.test(value)) return undefined;
  try {
    const resolved = new URL(value, 'http://tramontane.invalid');
    if (resolved.host !== 'tramontane.invalid') return undefined;
    return `${resolved.pathname}${resolved.search}${resolved.hash}`;
  } catch {
    return undefined;
  }
}
