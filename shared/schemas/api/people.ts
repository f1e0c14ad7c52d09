/** Answers about people: session, settings, members, invitations and the admin's people list (server/routes/{auth,me,members,invites,mailbox}.ts). */
import { z } from 'zod';
import { idSchema, isoTimeSchema, projectRoleSchema } from './common';

export const sessionUserSchema = z.object({ id: idSchema, email: z.string(), name: z.string(), isAdmin: z.boolean() });
export type SessionUser = z.infer<typeof sessionUserSchema>;

/** GET /auth/session: who is signed in here, and whether sign-in and the local mailbox exist. */
export const sessionResponse = z.discriminatedUnion('signedIn', [
  z.object({ signedIn: z.literal(false), signInAvailable: z.boolean() }),
  z.object({ signedIn: z.literal(true), signInAvailable: z.boolean(), user: sessionUserSchema, mailbox: z.boolean() }),
]);
export type Session = z.infer<typeof sessionResponse>;

export const signedOutEverywhereResponse = z.object({ ended: z.number().int().nonnegative() });

/** A person's settings; unit system lower-case on the wire. */
export const settingsSchema = z.object({ unitSystem: z.enum(['si', 'ip']), runNotices: z.boolean() });
export type Settings = z.infer<typeof settingsSchema>;

/** GET and PATCH /me. */
export const meResponse = z.object({
  user: sessionUserSchema,
  settings: settingsSchema,
  projects: z.array(z.object({ id: idSchema, name: z.string(), role: projectRoleSchema })),
});
export type Me = z.infer<typeof meResponse>;

/** GET /projects/:projectId/members. */
export const projectMembersResponse = z.object({
  project: z.object({ id: idSchema, name: z.string() }),
  yourRole: projectRoleSchema,
  canManage: z.boolean(),
  members: z.array(z.object({ userId: idSchema, name: z.string(), email: z.string(), role: projectRoleSchema })),
});
export type ProjectMembers = z.infer<typeof projectMembersResponse>;

export const memberRoleResponse = z.object({ userId: idSchema, role: projectRoleSchema });

export const inviteStatusSchema = z.enum(['pending', 'accepted', 'revoked', 'expired']);
export const inviteSchema = z.object({
  id: idSchema,
  email: z.string(),
  role: projectRoleSchema,
  invitedBy: z.string().nullable(),
  createdAt: isoTimeSchema,
  expiresAt: isoTimeSchema,
  status: inviteStatusSchema,
});
export type Invite = z.infer<typeof inviteSchema>;
export const inviteListResponse = z.object({ invites: z.array(inviteSchema) });
export const inviteSentResponse = z.object({ invite: inviteSchema.pick({ id: true, email: true, role: true, expiresAt: true, status: true }) });

/** POST /invites/preview: what an invitation link offers, shown before sign-in. */
export const invitePreviewResponse = z.object({
  projectId: idSchema,
  projectName: z.string(),
  role: projectRoleSchema,
  email: z.string(),
  invitedBy: z.string().nullable(),
  expiresAt: isoTimeSchema,
  signedIn: z.boolean(),
  forYou: z.boolean(),
});
export type InvitePreview = z.infer<typeof invitePreviewResponse>;
export const inviteAcceptedResponse = z.object({ projectId: idSchema, role: projectRoleSchema });

/** GET /admin/people. */
export const personSchema = z.object({ id: idSchema, name: z.string(), email: z.string(), isAdmin: z.boolean(), lastSignInAt: isoTimeSchema.nullable() });
export type Person = z.infer<typeof personSchema>;
export const peopleResponse = z.object({ people: z.array(personSchema) });
export const adminChangedResponse = z.object({ id: idSchema, isAdmin: z.boolean() });

/** GET /mailbox: the local fake SMTP server's catch (default set-up only). */
export const mailboxMessageSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
});
export type MailboxMessage = z.infer<typeof mailboxMessageSchema>;
export const mailboxResponse = z.object({ messages: z.array(mailboxMessageSchema) });

/** GET /audit and /projects/:projectId/audit: one line of the trail. */
export const auditEventSchema = z.object({
  id: idSchema,
  at: isoTimeSchema,
  actorId: idSchema.nullable(),
  actorName: z.string().nullable(),
  projectId: idSchema.nullable(),
  projectName: z.string().nullable(),
  action: z.string(),
  target: z.string(),
  detail: z.record(z.string(), z.unknown()),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;
export const auditResponse = z.object({ events: z.array(auditEventSchema) });
