// @ts-nocheck
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../server/demo/seed';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';

let h: BrowserHarness;
beforeAll(async () => {
  h = await startBrowserHarness();
  seedDemo(h.testApp.db);
});
afterAll(() => h?.close());

async function pickPerson(name: string) {
  await h.page.getByRole('heading', { name: 'Local sign-in' }).waitFor();
  await h.page.getByRole('button', { name: new RegExp(name) }).click();
}

async function signOut() {
  await h.page.getByRole('button', { name: 'Sign out', exact: true }).click();
  await h.page.getByTestId('sign-in').waitFor();
}

describe('signing in through the local provider', () => {
  it('the admin picks herself on the provider page and sees the demo project', async () => {
    await h.page.goto(h.baseUrl);
    await h.page.getByTestId('sign-in').click();
    await h.page.getByRole('heading', { name: 'Local sign-in' }).waitFor();
    expect(h.page.url().startsWith(h.testApp.provider.issuer)).toBe(true);
    await h.screenshot('sign-in-provider-picker');
    await pickPerson('Maren Vollert');
    await h.page.getByTestId('account').waitFor();
    expect(await h.page.getByTestId('account').innerText()).toContain('Maren Vollert');
    expect(await h.page.getByTestId('account').innerText()).toMatch(/admin/i);
    await h.page.getByText('Larchfield campus study (demo)').waitFor();
    expect(await h.page.getByRole('link', { name: 'Audit trail' }).isVisible()).toBe(true);
    await h.screenshot('sign-in-admin-home');
  });

  it('the owner invites a colleague; the mail shows in the mailbox', async () => {
    await h.page.goto(`${h.baseUrl}/projects/1/members`);
    await h.page.getByRole('heading', { name: 'Larchfield campus study (demo)' }).waitFor();
    expect(await h.page.getByRole('cell', { name: 'Tobias Ferrand' }).isVisible()).toBe(true);
    await h.page.getByRole('textbox', { name: 'E-mail' }).fill('rafa.underhill@consult.example');
    await h.page.getByRole('form', { name: 'Invite by e-mail' }).getByLabel('Role').selectOption('engineer');
    await h.page.getByRole('button', { name: 'Send invitation' }).click();
    await h.page.getByText('Invitation sent').waitFor();
    await h.page.getByRole('cell', { name: 'rafa.underhill@consult.example' }).waitFor();
    await h.screenshot('members-owner');

    await h.page.getByRole('link', { name: 'Mailbox' }).click();
    await h.page.getByTestId('message-body').waitFor();
    expect(await h.page.getByTestId('message-body').innerText()).toContain(
      'invited you to the Tramontane project "Larchfield campus study (demo)" as engineer',
    );
    await h.screenshot('mailbox');

    await h.page.getByRole('link', { name: 'Audit trail' }).click();
    await h.page.getByTestId('audit-table').waitFor();
    expect(await h.page.getByTestId('audit-table').innerText()).toContain('invite.sent');
    await h.screenshot('audit-trail');

    await h.page.goto(`${h.baseUrl}/projects/1/audit`);
    await h.page.getByText('Audit trail · Larchfield campus study (demo)').waitFor();
    await h.screenshot('audit-trail-project');

    await h.page.getByRole('link', { name: 'People' }).click();
    await h.page.getByRole('cell', { name: 'Priya Castellane', exact: true }).waitFor();
    expect(await h.page.getByRole('checkbox').first().isDisabled()).toBe(true); // the only admin cannot drop her own rights
    await h.screenshot('admin-people');
  });

  it('the colleague opens the link signed out, signs in as someone new, and joins', async () => {
    await h.page.goto(`${h.baseUrl}/mailbox`);
    const inviteLink = await h.page.getByTestId('message-body').getByRole('link').getAttribute('href');
    expect(inviteLink).toMatch(new RegExp(`^${h.baseUrl}/invites/accept\\?token=`));
    await signOut();
    await h.page.goto(inviteLink!);
    await h.page.getByText('You are not signed in').waitFor();
    await h.page.getByRole('link', { name: 'Sign in' }).last().click();
    await h.page.getByRole('heading', { name: 'Local sign-in' }).waitFor();
    await h.page.getByLabel('Name').fill('Rafa Underhill');
    await h.page.getByRole('textbox', { name: 'E-mail' }).fill('rafa.underhill@consult.example');
    await h.page.getByRole('button', { name: 'Sign in as this person' }).click();
    await h.page.getByRole('button', { name: 'Accept and join' }).waitFor();
    await h.screenshot('invite-accept');
    await h.page.getByRole('button', { name: 'Accept and join' }).click();
    await h.page.getByText('You joined Larchfield campus study (demo) as engineer.').waitFor();
    await h.page.getByRole('link', { name: 'Go to your projects' }).click();
    await h.page.getByText('Larchfield campus study (demo)').waitFor();
  });

  it('the client reviewer sees members read-only, with the reason', async () => {
    await signOut();
    await h.page.getByTestId('sign-in').click();
    await pickPerson('Priya Castellane');
    await h.page.getByTestId('account').waitFor();
    await h.page.goto(`${h.baseUrl}/projects/1/members`);
    await h.page.getByText('You are a viewer here').waitFor();
    expect(await h.page.getByRole('button', { name: 'Send invitation' }).isDisabled()).toBe(true);
    expect(await h.page.getByRole('link', { name: 'Audit trail' }).count()).toBe(0);
    await h.screenshot('members-viewer');
    await h.page.goto(`${h.baseUrl}/settings`);
    await h.page.getByRole('radio', { name: 'IP' }).click();
    await expect.poll(() => h.page.getByRole('radio', { name: 'IP' }).getAttribute('aria-checked')).toBe('true');
    // Remembered for the person, not only in this browser.
    await expect
      .poll(() =>
        h.page.evaluate(() =>
          fetch('/api/me')
            .then((r) => r.json())
            .then((b) => b.settings.unitSystem),
        ),
      )
      .toBe('ip');
    await h.screenshot('settings');
  });

  it('explains a failed sign-in', async () => {
    await signOut();
    await h.page.goto(`${h.baseUrl}/sign-in?problem=state_mismatch`);
    await h.page.getByText('This sign-in was started in another tab or browser').waitFor();
    await h.screenshot('sign-in-problem');
  });
});
