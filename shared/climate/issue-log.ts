/**
 * Collects report issues, listing at most a fixed number per kind so a badly broken
 * 30-year file still gives a report small enough to send as an API body; counts stay complete.
 */
import type { ImportIssue, IssueKind } from './types';

export const ISSUES_LISTED_PER_KIND = 25;

export class IssueLog {
  readonly issues: ImportIssue[] = [];
  readonly perKind = new Map<IssueKind, number>();
  notListed = 0;

  add(issue: ImportIssue): void {
    const seen = this.perKind.get(issue.kind) ?? 0;
    this.perKind.set(issue.kind, seen + 1);
    if (seen < ISSUES_LISTED_PER_KIND) this.issues.push(issue);
    else this.notListed++;
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
    return this.issues.some((i) => i.severity === 'error');
  }

  firstError(): ImportIssue | undefined {
    return this.issues.find((i) => i.severity === 'error');
  }
}
