// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { loadEnv } from '../../server/env';
import { safeReturnTo } from '../../server/auth/return-to';

describe('sign-in and mail settings from the environment', () => {
  it('starts the local stand-ins in demo mode when nothing else is set', () => {
    const env = loadEnv({ TRAMONTANE_DEMO: '1' });
    expect(env.TRAMONTANE_DEMO).toBe(true);
    expect(env.OIDC_ISSUER).toBeUndefined();
    expect(env.SMTP_HOST).toBeUndefined();
    expect(env.FAKE_OIDC_PORT).toBe(3001);
    expect(env.FAKE_SMTP_PORT).toBe(2525);
    expect(env.SMTP_SECURE).toBe(false);
  });

  it('takes a real provider and SMTP server', () => {
    const env = loadEnv({
      OIDC_ISSUER: 'https://login.example.com/tenant/v2.0',
      OIDC_CLIENT_ID: 'tramontane',
      OIDC_CLIENT_SECRET: 's3cret',
      TRAMONTANE_PUBLIC_URL: 'https://tramontane.firm.example',
      SMTP_HOST: 'smtp.firm.example',
      SMTP_PORT: '465',
      SMTP_SECURE: 'true',
    });
    expect(env).toMatchObject({ OIDC_CLIENT_ID: 'tramontane', SMTP_PORT: 465, SMTP_SECURE: true });
  });

  it('outside demo mode, refuses to start without a real provider and mail server, naming both', () => {
    expect(() => loadEnv({})).toThrow(/OIDC_ISSUER is required outside demo mode[\s\S]*SMTP_HOST is required outside demo mode/);
    expect(() => loadEnv({ OIDC_ISSUER: 'https://login.example.com', OIDC_CLIENT_ID: 'x' })).toThrow(/SMTP_HOST is required/);
  });

  it('keeps demo mode on loopback unless told otherwise', () => {
    expect(() => loadEnv({ TRAMONTANE_DEMO: '1', HOST: '0.0.0.0' })).toThrow(/demo mode listens on loopback only \(HOST=0\.0\.0\.0\)/);
    expect(loadEnv({ TRAMONTANE_DEMO: '1', HOST: '0.0.0.0', TRAMONTANE_DEMO_PUBLIC: '1' }).HOST).toBe('0.0.0.0');
    expect(loadEnv({ TRAMONTANE_DEMO: '1', HOST: '::1' }).HOST).toBe('::1');
    expect(() => loadEnv({ TRAMONTANE_DEMO: 'yes' })).toThrow(/TRAMONTANE_DEMO: must be 1 or 0/);
  });

  it('reads the admin e-mails as a lower-case list and names one that is not an address', () => {
    const real = { OIDC_ISSUER: 'https://login.example.com', OIDC_CLIENT_ID: 'x', SMTP_HOST: 'smtp.firm.example' };
    expect(loadEnv({ ...real, TRAMONTANE_ADMIN_EMAILS: ' Lena.Marquart@firm.example, ops@firm.example ' }).TRAMONTANE_ADMIN_EMAILS).toEqual([
      'lena.marquart@firm.example',
      'ops@firm.example',
    ]);
    expect(() => loadEnv({ ...real, TRAMONTANE_ADMIN_EMAILS: 'ops@firm.example, lena' })).toThrow(/"lena", which is not an e-mail address/);
  });

  it('refuses a half-configured provider, naming the missing variable', () => {
    expect(() => loadEnv({ TRAMONTANE_DEMO: '1', OIDC_ISSUER: 'https://login.example.com' })).toThrow(/OIDC_CLIENT_ID/);
    expect(() => loadEnv({ OIDC_CLIENT_ID: 'x' })).toThrow(/OIDC_ISSUER/);
    expect(() => loadEnv({ OIDC_ISSUER: 'not a url', OIDC_CLIENT_ID: 'x' })).toThrow(/OIDC_ISSUER/);
    expect(() => loadEnv({ SMTP_USER: 'me' })).toThrow(/SMTP_HOST/);
    expect(() => loadEnv({ SMTP_SECURE: 'yes' })).toThrow(/SMTP_SECURE/);
    expect(() => loadEnv({ TRAMONTANE_SECRET: 'short' })).toThrow(/at least 32 characters/);
  });
});

describe('where sign-in may return to', () => {
  it.each([
    ['', '/'],
    ['/', '/'],
    ['/projects/3/members', '/projects/3/members'],
    ['/invites/accept?token=a.b.c', '/invites/accept?token=a.b.c'],
    ['/audit#top', '/audit#top'],
  ])('keeps the path %j as %j', (input, expected) => {
    expect(safeReturnTo(input)).toBe(expected);
  });

  it.each(['//evil.example', '///evil.example', '/\\evil.example', 'https://evil.example/', 'evil.example', '/a\nb', '/a\\b', 'javascript:alert(1)'])(
    'refuses %j',
    (input) => {
      expect(safeReturnTo(input)).toBeUndefined();
    },
  );

  it('refuses anything but a string', () => {
    expect(safeReturnTo(['/a', '/b'])).toBeUndefined();
    expect(safeReturnTo({ path: '/' })).toBeUndefined();
  });
});
