/**
 * Collects report issues. The report lists the first 200 found (and every error: they are few, since one stops the
 * import), so a badly broken 30-year file still gives a small API body; counts stay complete, and every issue is
 * also written as a CSV row for the
 * full list the user can download (up to ISSUE_ROWS_CHARS characters, which covers any file within the upload limits
 * unless nearly every cell of it is bad).
 * Text taken from the file (a cell, a header) is cut and marked (echo-limits.ts), so a hostile line of megabytes
 * is never echoed back whole.
 */
// @ts-nocheck

import { csvRow } from '../csv';
import { cutCell, cutMessage } from './echo-limits';
import type { ImportIssue, IssueKind } from './types';

export const ISSUES_LISTED = 200;
/** Characters of CSV rows kept for the full issue list; past this, issues are counted but not written. */
export const ISSUE_ROWS_CHARS = 8_000_000;
/** The full list's columns, in the order of each row (a set of files adds `file` first). */
export const ISSUE_CSV_COLUMNS = ['severity', 'kind', 'line', 'column', 'value', 'message'] as const;

function bounded(issue: ImportIssue): ImportIssue {
  const out: ImportIssue = { ...issue, message: cutMessage(issue.message) };
  if (issue.value !== undefined) out.value = cutCell(issue.value);
  if (issue.column !== undefined) out.column = cutCell(issue.column);
  return out;
}

export class IssueLog {
  readonly issues: ImportIssue[] = [];
  readonly perKind = new Map<IssueKind, number>();
  /** Issues found but not listed in `issues`. */
  notListed = 0;
  /** Every issue as a CSV row of ISSUE_CSV_COLUMNS (with `file` first for issues of a set), in the order found. */
  readonly rows: string[] = [];
  /** Issues counted but not written to `rows`, past ISSUE_ROWS_CHARS. */
  notWritten = 0;
  private rowChars = 0;
  private errors = 0;
  private first: ImportIssue | undefined;

  /** `ofSet`: the log of a set of files, whose rows start with the file's name (empty for the set's own issues). */
  constructor(private readonly ofSet = false) {}

  add(raw: ImportIssue): void {
    const issue = bounded(raw);
    this.listBounded(issue);
    this.writeRow(issue);
  }

  private listBounded(issue: ImportIssue): void {
    this.perKind.set(issue.kind, this.count(issue.kind) + 1);
    if (issue.severity === 'error') {
      this.errors++;
      this.first ??= issue;
    }
    if (this.issues.length < ISSUES_LISTED || issue.severity === 'error') this.issues.push(issue);
    else this.notListed++;
  }

  /** Lists an issue already written elsewhere (a file's own, re-listed for its set) without writing its row again. */
  list(issue: ImportIssue): void {
    // already cut by the log it came from
    this.listBounded(issue);
  }

  /** Takes over another log's full list (a file of a set), each row prefixed with the file's name. */
  adoptRows(rows: readonly string[], notWritten: number, fileName: string): void {
    const prefix = `${csvRow([fileName])},`;
    for (const row of rows) this.pushRow(prefix + row);
    this.notWritten += notWritten;
  }

  private writeRow(issue: ImportIssue): void {
    const cells = [issue.severity, issue.kind, issue.line ?? '', issue.column ?? '', issue.value ?? '', issue.message];
    this.pushRow(csvRow(this.ofSet ? [issue.file ?? '', ...cells] : cells));
  }

  private pushRow(row: string): void {
    if (this.rowChars + row.length > ISSUE_ROWS_CHARS) {
      this.notWritten++;
      return;
    }
    this.rows.push(row);
    this.rowChars += row.length + 1;
  }

  error(kind: IssueKind, message: string, at: Omit<ImportIssue, 'kind' | 'severity' | 'message'> = {}): void {
    this.add({ kind, severity: 'error', ...at, message });
  }

  warning(kind: IssueKind, message: string, at: Omit<ImportIssue, 'kind' | 'severity' | 'message'> = {}): void {
    this.add({ kind, severity: 'warning', ...at, message });
  }

  info(kind: IssueKind, message: string, at: Omit<ImportIssue, 'kind' | 'severity' | 'message'> = {}): void {
    this.add({ kind, severity: 'info', ...at, message });
  }

  count(kind: IssueKind): number {
    return this.perKind.get(kind) ?? 0;
  }

  hasErrors(): boolean {
    return this.errors > 0;
  }

  firstError(): ImportIssue | undefined {
    return this.first;
  }
}

/** The full issue list as CSV text: a header row, every written row, and a closing note when some were not written. */
export function issueListCsv(rows: readonly string[], notWritten: number, ofSet: boolean): string {
  const header = csvRow(ofSet ? ['file', ...ISSUE_CSV_COLUMNS] : [...ISSUE_CSV_COLUMNS]);
  const note =
    notWritten > 0
      ? [`# ${notWritten.toLocaleString('en')} more issues were found but not written: the list stops at ${ISSUE_ROWS_CHARS.toLocaleString('en')} characters.`]
      : [];
  return `${[header, ...rows, ...note].join('\n')}\n`;
}
