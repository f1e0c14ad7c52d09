// @ts-nocheck
import { and, eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { memberships, projects, users } from '../db/schema';
import type { Mailer } from './mailer';
import { runFinishedMail } from './messages';

/**
 * Tells the project's members who opted in that a run (or a whole sweep) finished. Mail failures are reported to `logError`
 * and never fail the run. Returns the addresses written to.
 */
export async function sendRunFinishedNotices(
  deps: { db: Db; mailer?: Mailer; publicUrl?: string; logError?: (error: unknown) => void },
  run: { projectId: number; runName: string; path: string; kind?: 'run' | 'sweep' },
): Promise<string[]> {
  if (!deps.mailer) return [];
  const project = deps.db.select({ name: projects.name }).from(projects).where(eq(projects.id, run.projectId)).get();
  if (!project) return [];
  const recipients = deps.db
    .select({ email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.projectId, run.projectId), eq(users.runNotices, true)))
    .all()
    .map((r) => r.email);
  const link = `${(deps.publicUrl ?? 'http://localhost:3000').replace(/\/$/, '')}${run.path}`;
  const sent: string[] = [];
  for (const to of recipients) {
    try {
      await deps.mailer.send(runFinishedMail({ to, projectName: project.name, runName: run.runName, link, kind: run.kind }));
      sent.push(to);
    } catch (error) {
      deps.logError?.(error);
    }
  }
  return sent;
}
