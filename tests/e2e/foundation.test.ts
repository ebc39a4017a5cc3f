import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, type OpenBrowser } from './support/browser';
import { demoPassword, fillSignIn, linkFromInbox, newPerson, signIn, signOut } from './support/studio-steps';
import '../setup/provided-context';

// The walk of the foundation issue, in one browser: a new owner sets up a studio, invites an
// editor by e-mail, the editor joins from the inbox link; then the demo reviewer looks around.
const appUrl = inject('appUrl');
const inboxUrl = inject('inboxUrl');

const owner = newPerson('Mara Quill', 'owner');
const studioName = 'Quill & Kelp Prints';
const editor = newPerson('Oskar Brine', 'editor');

let browser: OpenBrowser;
let page: Page;

beforeAll(async () => {
  browser = await openBrowser();
  page = await browser.newPage();
  page.setDefaultTimeout(15_000);
});

afterAll(async () => {
  await browser?.close();
});

const heading = (name: string | RegExp) => page.getByRole('heading', { level: 1, name });

// Members and settings sit in the account menu, beside the studio's name.
async function openFromAccountMenu(item: string): Promise<void> {
  await page.getByRole('button', { name: /^Your account:/ }).click();
  await page.getByRole('menuitem', { name: item, exact: true }).click();
}

async function openMembers(): Promise<void> {
  await openFromAccountMenu('Members');
  await heading('Members').waitFor();
  await page.getByRole('table').waitFor();
}

describe('a new studio and its first editor', () => {
  it('sets up a new studio whose owner is the person who signed up', async () => {
    await page.goto(`${appUrl}/sign-up`);
    await heading('Set up your studio').waitFor();
    await page.getByLabel('Your name').fill(owner.name);
    await page.getByLabel('E-mail address').fill(owner.email);
    await page.getByLabel('Password', { exact: true }).fill(owner.password);
    await page.getByLabel('Studio name').fill(studioName);
    await page.getByRole('button', { name: 'Create studio' }).click();

    await page.waitForURL((url) => url.pathname === '/');
    await heading('Welcome, Mara').waitFor();
    expect(await page.getByText(`You are in ${studioName} as owner.`).isVisible()).toBe(true);
    await browser.screenshot(page, 'foundation-01-owner-home');
  });

  it('lets the owner invite an editor by e-mail from the members page', async () => {
    await openMembers();
    // The owner's editing controls are there: the same checks show them missing for a reviewer.
    await page.getByRole('heading', { name: 'Invite someone' }).waitFor();
    expect(await page.getByRole('combobox', { name: `Role of ${owner.name}` }).count()).toBe(1);
    // the studio's only owner is told why there is no way to leave, rather than offered one that fails
    expect(await page.getByRole('button', { name: `Leave ${owner.name}` }).count()).toBe(0);
    expect(await page.getByText('Only owner: make someone else an owner before leaving').count()).toBe(1);

    await page.getByLabel('E-mail address').fill(editor.email);
    await page.getByLabel('Role', { exact: true }).selectOption('editor');
    await page.getByRole('button', { name: 'Send invitation' }).click();

    const sent = page.getByRole('status').filter({ hasText: `Invitation sent to ${editor.email}` });
    await sent.waitFor();
    const waiting = page.getByRole('listitem').filter({ hasText: editor.email });
    expect(await waiting.innerText()).toContain('Editor · invited by Mara Quill');
    await browser.screenshot(page, 'foundation-02-invitation-sent');
  });

  it('lets the invited person open the e-mailed link, create an account and join as editor', async () => {
    const link = await linkFromInbox(inboxUrl, appUrl, editor.email, /invited you to/);
    expect(new URL(link).pathname).toMatch(/^\/invitations\/[^/]+$/);

    // Still signed in as the owner: the page says the invitation is for someone else.
    await page.goto(link);
    await heading(`Join ${studioName}`).waitFor();
    await page.getByText('This invitation is for someone else').waitFor();
    await page.getByRole('button', { name: 'Sign out' }).click();

    await page.getByRole('heading', { name: 'Create your account' }).waitFor();
    const invitationFacts = await page.locator('dl').innerText();
    expect(invitationFacts).toContain('Editor · Imports originals');
    expect(invitationFacts).toContain(editor.email);
    await browser.screenshot(page, 'foundation-03-invitation-new-account');
    await page.getByLabel('Your name').fill(editor.name);
    await page.getByLabel('Password', { exact: true }).fill(editor.password);
    await page.getByRole('button', { name: 'Create account and join' }).click();

    await page.waitForURL((url) => url.pathname === '/');
    await heading('Welcome, Oskar').waitFor();
    expect(await page.getByText(`You are in ${studioName} as editor.`).isVisible()).toBe(true);
    await browser.screenshot(page, 'foundation-04-editor-home');
  });

  it('does not let the same invitation link be used twice', async () => {
    const link = await linkFromInbox(inboxUrl, appUrl, editor.email, /invited you to/);
    await page.goto(link);
    const problem = page.getByRole('alert').filter({ hasText: 'This invitation cannot be used' });
    await problem.waitFor();
    await browser.screenshot(page, 'foundation-04b-invitation-used');
    expect(await problem.innerText()).toMatch(/already|used/i);
    expect(await page.getByRole('button', { name: /join/i }).count()).toBe(0);
  });

  it('signs the new editor out and back in to the same studio, where editors cannot manage members', async () => {
    await page.goto(`${appUrl}/`);
    await heading('Welcome, Oskar').waitFor();
    await signOut(page, editor.name);
    await signIn(page, appUrl, editor.email, editor.password);
    expect(await page.getByText(`You are in ${studioName} as editor.`).isVisible()).toBe(true);

    await openMembers();
    const ownerRow = page.getByRole('row').filter({ hasText: owner.email });
    expect(await ownerRow.innerText()).toContain('Owner');
    const editorRow = page.getByRole('row').filter({ hasText: editor.email });
    expect(await editorRow.innerText()).toContain('Editor');
    expect(await page.getByRole('heading', { name: 'Invite someone' }).count()).toBe(0);
    expect(await page.getByRole('combobox').count()).toBe(0);
    await browser.screenshot(page, 'foundation-05-editor-members');
    await signOut(page, editor.name);
  });
});

describe('the demo reviewer', () => {
  it('sees the members page with no invite form, role choices or remove buttons', async () => {
    await signIn(page, appUrl, 'june@saltmarsh.test', demoPassword);
    expect(await page.getByText('You are in Saltmarsh Studio as reviewer.').isVisible()).toBe(true);

    await openMembers();
    await page.getByRole('row').filter({ hasText: 'ines@saltmarsh.test' }).waitFor();
    expect(await page.getByText('Only owners invite people and change roles.').isVisible()).toBe(true);
    expect(await page.getByRole('heading', { name: 'Invite someone' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Send invitation' }).count()).toBe(0);
    expect(await page.getByRole('combobox').count()).toBe(0);
    expect(await page.getByRole('button', { name: /^(Remove|Leave|Withdraw)\b/ }).count()).toBe(0);
    await browser.screenshot(page, 'foundation-06-reviewer-members');
  });

  it('sees the studio settings read-only', async () => {
    await openFromAccountMenu('Studio settings');
    await heading('Settings').waitFor();
    await page.getByText('Only owners change these settings.').waitFor();
    const studioNameValue = page.locator('dt', { hasText: 'Studio name' }).locator('xpath=following-sibling::dd');
    expect(await studioNameValue.innerText()).toBe('Saltmarsh Studio');
    expect(await page.getByRole('textbox').count()).toBe(0);
    expect(await page.getByRole('spinbutton').count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Save settings' }).count()).toBe(0);
    await browser.screenshot(page, 'foundation-07-reviewer-settings');
    await signOut(page, 'June Abara');
  });
});

describe('signing in and resetting a password', () => {
  it("shows the server's message inline when the password is wrong", async () => {
    // The words the server answers with, so the page is checked against the API, not a copy.
    const answer = await signInThroughApi('ines@saltmarsh.test', 'not the right password');
    expect(answer.status).toBe(401);

    await page.goto(`${appUrl}/sign-in`);
    await fillSignIn(page, 'ines@saltmarsh.test', 'not the right password');
    const alert = page.getByRole('alert');
    await alert.waitFor();
    expect(await alert.innerText()).toBe(answer.message);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    // Focus moves to the message, so a keyboard or screen reader user lands on it.
    expect(await alert.evaluate((element) => element === document.activeElement)).toBe(true);
    await browser.screenshot(page, 'foundation-08-wrong-password');
  });

  it('resets a password through the e-mailed link, once, and signs in with the new one', async () => {
    const newPassword = 'tide tables at dawn';
    await page.goto(`${appUrl}/sign-in`);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await heading('Choose a new password').waitFor();
    await page.getByLabel('E-mail address').fill(editor.email);
    await page.getByRole('button', { name: 'Send the link' }).click();
    await heading('Check your inbox').waitFor();

    const link = await linkFromInbox(inboxUrl, appUrl, editor.email, /Reset your Motifold password/);
    expect(new URL(link).pathname).toBe('/reset-password');
    await page.goto(link);
    await heading('Choose a new password').waitFor();
    await page.getByLabel('New password', { exact: true }).fill(newPassword);
    await page.getByLabel('New password again').fill(newPassword);
    await page.getByRole('button', { name: 'Save new password' }).click();
    await heading('Your password is changed').waitFor();
    await browser.screenshot(page, 'foundation-09-password-changed');

    // The old password no longer opens the account; the new one does.
    expect((await signInThroughApi(editor.email, editor.password)).status).toBe(401);
    await signIn(page, appUrl, editor.email, newPassword);
    expect(await page.getByText(`You are in ${studioName} as editor.`).isVisible()).toBe(true);
    await signOut(page, editor.name);

    // The same link a second time: the server's "already used" message, and no form.
    await page.goto(link);
    await heading('Choose a new password').waitFor();
    await page.getByLabel('New password', { exact: true }).fill('another long password');
    await page.getByLabel('New password again').fill('another long password');
    await page.getByRole('button', { name: 'Save new password' }).click();
    await heading('This link cannot be used').waitFor();
    expect(await page.getByRole('alert').innerText()).toContain('already been used');
    await browser.screenshot(page, 'foundation-10-reset-link-used');
  });
});

// A request outside the browser (its own cookie jar), with the CSRF token the API asks for.
async function signInThroughApi(email: string, password: string): Promise<{ status: number; message: string }> {
  const csrf = await fetch(`${appUrl}/api/auth/csrf`);
  const cookie = csrf.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const response = await fetch(`${appUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken, cookie },
    body: JSON.stringify({ email, password }),
  });
  const body = (await response.json()) as { error?: { message?: string } };
  return { status: response.status, message: body.error?.message ?? '' };
}
