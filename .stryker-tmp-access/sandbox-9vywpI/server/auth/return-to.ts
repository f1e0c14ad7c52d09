/**
 * Where to send someone after sign-in: only a path on this site. Anything that a browser could read as
 * another host (`//evil.example`, `/\evil.example`, `https://…`, control characters) is refused, and so is a
 * path that only becomes one after normalising (`/.//evil.example`, `/%2e%2e//evil.example`): the check runs
 * on what the redirect would actually carry, which is what closes the open redirect.
 */
// @ts-nocheck

export function safeReturnTo(value: unknown): string | undefined {
  if (value === undefined || value === '') return '/';
  if (typeof value !== 'string' || value.length > 2000) return undefined;
  // eslint-disable-next-line no-control-regex -- finding control characters is this check's purpose
  if (!isSitePath(value) || /[\u0000-\u001f\u007f\\]/.test(value)) return undefined;
  try {
    const resolved = new URL(value, 'http://tramontane.invalid');
    if (resolved.host !== 'tramontane.invalid') return undefined;
    const normalised = `${resolved.pathname}${resolved.search}${resolved.hash}`;
    return isSitePath(normalised) ? normalised : undefined;
  } catch {
    return undefined;
  }
}

/** A path a browser resolves on this host: one leading slash, not two, not a slash and a backslash. */
function isSitePath(path: string): boolean {
  return path.startsWith('/') && !path.startsWith('//') && !path.startsWith('/\\');
}
