// @ts-nocheck
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { users } from '../../server/db/schema';
import { sendRunFinishedNotices } from '../../server/mail/notices';
import { createSmtpMailer } from '../../server/mail/mailer';
import { signInThroughProvider, startSignInStack, type SignInStack } from '../support/sign-in';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';

const day = 86_400_000;
let now = Date.parse('2026-05-11T08:00:00Z');
const clock = () => new Date(now);

let t: SignInStack;
let owner: TestPerson;
let engineer: TestPerson;
let admin: TestPerson;
let projectId: number;

beforeAll(async () => {
  t = await startSignInStack({ overrides: { clock, inviteLifetimeMs: 3 * day, sessionPolicy: { idleMs: 30 * day, absoluteMs: 60 * day } } });
  admin = personWithSession(t.db, 'admin@example.test', { isAdmin: true });
  owner = personWithSession(t.db, 'olwen@example.test');
  engineer = personWithSession(t.db, 'ezra@example.test');
  t.db.update(users).set({ name: 'Olwen Tarrant' }).where(eq(users.id, owner.id)).run();
  projectId = projectWithMembers(t.db, 'Quayside retrofit', [
    [owner, 'owner'],
    [engineer, 'engineer'],
  ]);
});
afterAll(() => t.close());

const agent = () => request.agent(t.app).set('x-tramontane-request', '1');

function invite(email: string, role = 'viewer') {
  return request(t.app).post(`/api/projects/${projectId}/invites`).set(asPerson(owner)).send({ email, role });
}

/** The newest message to `to` at the fake SMTP server, read through the admin's mailbox route. */
async function lastMailTo(to: string) {
  const box = await request(t.app).get('/api/mailbox').set(asPerson(admin)).expect(200);
  const message = box.body.messages.find((m: { to: string[] }) => m.to.includes(to));
  if (!message) throw new Error(`No mail to ${to}; the mailbox holds ${box.body.messages.length} messages.`);
  return message as { subject: string; text: string; from: string; to: string[] };
}

const tokenFrom = (text: string) => new URL(text.match(/https?:\/\/\S+\/invites\/accept\?token=\S+/)![0]).searchParams.get('token')!;

describe('an owner invites a colleague by e-mail', () => {
  it('the mail arrives at the SMTP server, and the colleague accepts after signing in', async () => {
    const sent = await invite('Nadia.Rask@consult.example', 'engineer').expect(201);
    expect(sent.body.invite).toMatchObject({ email: 'nadia.rask@consult.example', role: 'engineer', status: 'pending' });

    const mail = await lastMailTo('nadia.rask@consult.example');
    expect(mail.subject).toBe('Olwen Tarrant invited you to "Quayside retrofit" on Tramontane');
    expect(mail.from).toContain('tramontane@test.invalid');
    expect(mail.text).toContain(`${t.publicUrl}/invites/accept?token=`);
    const token = tokenFrom(mail.text);

    const nadia = agent();
    await nadia.post('/api/invites/accept').send({ token }).expect(401);
    await signInThroughProvider(t, nadia, { name: 'Nadia Rask', email: 'nadia.rask@consult.example' }, `/invites/accept?token=${token}`);
    const preview = await nadia.post('/api/invites/preview').send({ token }).expect(200);
    expect(preview.body).toMatchObject({ projectId, projectName: 'Quayside retrofit', role: 'engineer', invitedBy: 'Olwen Tarrant', forYou: true });
    const accepted = await nadia.post('/api/invites/accept').send({ token }).expect(200);
    expect(accepted.body).toEqual({ projectId, role: 'engineer' });
    const mine = await nadia.get('/api/projects').expect(200);
    expect(mine.body.projects).toEqual([expect.objectContaining({ id: projectId, role: 'engineer' })]);

    // Single use: the same link again is refused.
    const again = await nadia.post('/api/invites/accept').send({ token }).expect(410);
    expect(again.body.error.code).toBe('invite_used');

    const listed = await request(t.app).get(`/api/projects/${projectId}/invites`).set(asPerson(owner)).expect(200);
    expect(listed.body.invites[0]).toMatchObject({ email: 'nadia.rask@consult.example', status: 'accepted', invitedBy: 'Olwen Tarrant' });
    const trail = await request(t.app).get(`/api/projects/${projectId}/audit?action=invite.`).set(asPerson(owner)).expect(200);
    expect(trail.body.events.map((e: { action: string }) => e.action)).toEqual(['invite.accepted', 'invite.sent']);
  });

  it('an expired link is refused', async () => {
    await invite('late.comer@consult.example').expect(201);
    const token = tokenFrom((await lastMailTo('late.comer@consult.example')).text);
    const late = agent();
    await signInThroughProvider(t, late, { name: 'Late Comer', email: 'late.comer@consult.example' });
    now += 3 * day + 60_000;
    const res = await late.post('/api/invites/accept').send({ token }).expect(410);
    expect(res.body.error.code).toBe('invite_expired');
    const listed = await request(t.app).get(`/api/projects/${projectId}/invites`).set(asPerson(owner)).expect(200);
    expect(listed.body.invites[0]).toMatchObject({ email: 'late.comer@consult.example', status: 'expired' });
  });

  it('a link sent to someone else is refused, and a tampered link is invalid', async () => {
    await invite('right.person@consult.example').expect(201);
    const token = tokenFrom((await lastMailTo('right.person@consult.example')).text);
    const wrong = agent();
    await signInThroughProvider(t, wrong, { name: 'Wrong Person', email: 'wrong.person@consult.example' });
    const res = await wrong.post('/api/invites/accept').send({ token }).expect(403);
    expect(res.body.error.message).toBe('This invitation was sent to right.person@consult.example; you are signed in as wrong.person@consult.example.');
    const [header, payload, signature] = token.split('.');
    const forged = `${header}.${Buffer.from(JSON.stringify({ ...JSON.parse(Buffer.from(payload, 'base64url').toString()), inv: 1 })).toString('base64url')}.${signature}`;
    expect((await wrong.post('/api/invites/accept').send({ token: forged }).expect(400)).body.error.code).toBe('invite_invalid');
  });

  it('a withdrawn invitation cannot be accepted', async () => {
    const sent = await invite('changed.mind@consult.example').expect(201);
    const token = tokenFrom((await lastMailTo('changed.mind@consult.example')).text);
    await request(t.app).delete(`/api/projects/${projectId}/invites/${sent.body.invite.id}`).set(asPerson(owner)).expect(204);
    const who = agent();
    await signInThroughProvider(t, who, { name: 'Changed Mind', email: 'changed.mind@consult.example' });
    expect((await who.post('/api/invites/accept').send({ token }).expect(410)).body.error.code).toBe('invite_revoked');
  });

  it('refuses inviting a member again, a bad address, and an engineer inviting', async () => {
    expect((await invite('ezra@example.test').expect(409)).body.error.code).toBe('already_member');
    expect((await invite('not-an-address').expect(400)).body.error.message).toContain('email');
    await request(t.app).post(`/api/projects/${projectId}/invites`).set(asPerson(engineer)).send({ email: 'x@consult.example', role: 'viewer' }).expect(403);
  });

  it('answers 502 and keeps nothing when the mail server cannot be reached', async () => {
    const s = await startSignInStack({
      overrides: { mailer: createSmtpMailer({ host: '127.0.0.1', port: 9, secure: false, from: 'x@test.invalid' }), logError: () => {} },
    });
    try {
      const o = personWithSession(s.db, 'o@example.test');
      const p = projectWithMembers(s.db, 'P', [[o, 'owner']]);
      const res = await request(s.app).post(`/api/projects/${p}/invites`).set(asPerson(o)).send({ email: 'a@b.example', role: 'viewer' }).expect(502);
      expect(res.body.error.code).toBe('mail_failed');
      expect((await request(s.app).get(`/api/projects/${p}/invites`).set(asPerson(o)).expect(200)).body.invites).toEqual([]);
    } finally {
      await s.close();
    }
  });
});

describe('run-finished notices', () => {
  it('go only to members who turned them on', async () => {
    await request(t.app).patch('/api/me').set(asPerson(engineer)).send({ runNotices: true }).expect(200);
    const sent = await sendRunFinishedNotices(
      { db: t.db, mailer: createSmtpMailer({ host: t.smtp.host, port: t.smtp.port, secure: false, from: 'runs@test.invalid' }), publicUrl: t.publicUrl },
      { projectId, runName: 'Direct air, A1, typical year', path: `/projects/${projectId}/runs/7` },
    );
    expect(sent).toEqual(['ezra@example.test']);
    const mail = await lastMailTo('ezra@example.test');
    expect(mail.subject).toBe('Run finished: Direct air, A1, typical year (Quayside retrofit)');
    expect(mail.text).toContain(`${t.publicUrl}/projects/${projectId}/runs/7`);
  });
});

describe('the mailbox', () => {
  it('is for admins only', async () => {
    await request(t.app).get('/api/mailbox').set(asPerson(owner)).expect(403);
  });
});
