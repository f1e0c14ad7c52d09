import { Marked, type Tokens } from 'marked';
import methodMarkdown from '../../docs/method.md?raw';

/**
 * The method exists once, in docs/method.md. The report and the excursions page show parts of it, taken from the
 * file at build time (Vite's `?raw`) and rendered here. A part is the text between `<!-- part: name -->` and
 * `<!-- end: name -->`; the names below are every part the app shows (tests/component/method-doc.test.tsx checks
 * each one is in the file).
 */
export const METHOD_PARTS = [
  'symbols',
  'moist-air',
  'envelope-limits',
  'fan-heat',
  'classification',
  'classify-direct-air',
  'classify-indirect-air',
  'exchanger',
  'classify-water-side',
  'classify-hybrid',
  'mechanical-fraction',
  'energy-and-water',
  'engine-1',
  'results',
  'limits',
  'sources',
  'inlet-model',
  'inlet-direct-air',
  'inlet-indirect-air',
  'inlet-water-side',
  'inlet-hall-moisture',
  'excursion-counting',
] as const;

export type MethodPart = (typeof METHOD_PARTS)[number];

/** The Markdown of one part of a method document; a RangeError names a part the document lacks. */
export function methodPartMarkdown(markdown: string, part: string): string {
  const start = `<!-- part: ${part} -->`;
  const end = `<!-- end: ${part} -->`;
  const from = markdown.indexOf(start);
  const to = markdown.indexOf(end, from);
  if (from < 0 || to < 0) throw new RangeError(`docs/method.md has no part "${part}" (between ${start} and ${end}).`);
  return markdown.slice(from + start.length, to).trim();
}

/**
 * Only the repository's own text is rendered, so no sanitiser is needed; links become plain text, since their
 * targets (headings and files of docs/) are not pages of the app. The output has no script and no style attribute,
 * as the built client's Content-Security-Policy requires.
 */
const renderer = new Marked({
  gfm: true,
  async: false,
  renderer: {
    link(token: Tokens.Link) {
      return this.parser.parseInline(token.tokens);
    },
  },
});

const rendered = new Map<MethodPart, string>();

/** One part of docs/method.md as HTML, rendered once per page load. */
export function methodPartHtml(part: MethodPart): string {
  let html = rendered.get(part);
  if (html === undefined) {
    html = renderer.parse(methodPartMarkdown(methodMarkdown, part)) as string;
    rendered.set(part, html);
  }
  return html;
}
