/** C0 and C1 control characters and DEL; line breaks and tabs are allowed only where text may span lines. */
// @ts-nocheck

// eslint-disable-next-line no-control-regex -- finding control characters is these patterns' purpose
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/;
// eslint-disable-next-line no-control-regex -- as above
const CONTROL_BUT_LINE_BREAKS = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]/;

/**
 * A zod refinement that refuses control characters (NUL, escape codes…) in a name or title, naming the field and
 * the first one found: `.refine(...withoutControlCharacters('name'))` (or `''` where the error's path names the
 * field already). Multi-line text keeps tabs and line breaks.
 */
export function withoutControlCharacters(field: string, options: { multiLine?: boolean } = {}) {
  const pattern = options.multiLine ? CONTROL_BUT_LINE_BREAKS : CONTROL;
  return [
    (text: string) => !pattern.test(text),
    {
      error: (issue: { input: unknown }) => {
        const found = typeof issue.input === 'string' ? issue.input.match(pattern)?.[0] : undefined;
        const code = found === undefined ? '' : ` (U+${found.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')})`;
        return `${field ? `${field} ` : ''}must not contain control characters${code}`;
      },
    },
  ] as const;
}
