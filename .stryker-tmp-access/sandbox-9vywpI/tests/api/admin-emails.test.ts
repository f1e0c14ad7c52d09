// @ts-nocheck
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signInThroughProvider, startSignInStack, type SignInStack } from '../support/sign-in';

let t: SignInStack;
beforeAll(async () => {
  t = await startSignInStack({ overrides: { adminEmails: ['lena.marquart@firm.example'] } });
});
afterAll(() => t.close());

const agent = () => request.agent(t.app).set('x-tramontane-request', '1');

describe('organisation admins named by TRAMONTANE_ADMIN_EMAILS', () => {
  it('the first person to sign in is not made admin when admins are named', async () => {
    const a = agent();
    await signInThroughProvider(t, a, { name: 'Bo Lindqvist', email: 'bo@firm.example' });
    expect((await a.get('/api/me').expect(200)).body.user.isAdmin).toBe(false);
  });

  it('a named, provider-verified e-mail becomes admin at sign-in, whatever its case', async () => {
    const a = agent();
    await signInThroughProvider(t, a, { name: 'Lena Marquart', email: 'Lena.Marquart@firm.example' });
    expect((await a.get('/api/me').expect(200)).body.user.isAdmin).toBe(true);
  });
});
