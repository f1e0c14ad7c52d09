/**
 * Bounds on text from an uploaded file that the server echoes back (preview, report, mapping): a hostile upload of
 * one 30 MB line must not come back as a 60 MB response. Cut text keeps its start and says how long it was.
 */
// @ts-nocheck

import type { DetectedMapping, QuantityAssignment } from './types';

/** Longest text from the file echoed back as one cell (a value, a header), characters. */
export const ECHO_CELL_CHARS = 200;
/** Longest issue message, characters (a message quotes at most a few cut cells). */
export const ISSUE_MESSAGE_CHARS = 1_000;
/** Longest line of the file echoed in a preview's first lines, characters. */
export const ECHO_LINE_CHARS = 1_000;
/** Lines of the file echoed in a preview. */
export const ECHO_LINES = 12;

/** `text` as echoed back: at most `max` characters, and when longer, cut and marked with its full length. */
export function cutCell(text: string, max = ECHO_CELL_CHARS): string {
  return text.length <= max ? text : cutMarked(text.slice(0, max), text.length);
}

const cutMarked = (start: string, fullLength: number) => `${start}… [cut: ${fullLength.toLocaleString('en')} characters]`;

/** A message with every quoted run of file text cut to ECHO_CELL_CHARS, and the whole to ISSUE_MESSAGE_CHARS. */
export function cutMessage(message: string): string {
  const quotesCut = message.length <= ECHO_CELL_CHARS ? message : message.replace(/"([^"]{201,})"/g, (_, inner: string) => `"${cutCell(inner)}"`);
  return cutCell(quotesCut, ISSUE_MESSAGE_CHARS);
}

function boundedAssignment(a: QuantityAssignment | null): QuantityAssignment | null {
  return a && { ...a, header: cutCell(a.header), reason: cutMessage(a.reason) };
}

/** The mapping as echoed back: headers and the words describing columns cut (column indices are unchanged). */
export function boundedMapping(mapping: DetectedMapping): DetectedMapping {
  return {
    ...mapping,
    headers: mapping.headers.map((h) => cutCell(h)),
    time: mapping.time && { ...mapping.time, description: cutMessage(mapping.time.description) },
    dryBulb: boundedAssignment(mapping.dryBulb),
    humidity: boundedAssignment(mapping.humidity),
    pressure: boundedAssignment(mapping.pressure),
  };
}

/** The first lines of a text, for a preview: at most ECHO_LINES lines of at most ECHO_LINE_CHARS each (cut and marked). */
export function firstLinesEchoed(text: string): string[] {
  const lines: string[] = [];
  for (let at = 0; lines.length < ECHO_LINES;) {
    const lf = text.indexOf('\n', at);
    const end = lf === -1 ? text.length : lf;
    const length = end - at;
    // only the echoed part is copied out of a long line
    lines.push(length > ECHO_LINE_CHARS ? cutMarked(text.slice(at, at + ECHO_LINE_CHARS), length) : text.slice(at, end).replace(/\r$/, ''));
    if (lf === -1) break;
    at = lf + 1;
  }
  return lines;
}
