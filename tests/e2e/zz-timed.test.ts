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
  console.log('T', (performance.now()/1000).toFixed(2), 'await browser?.close();');
});

const heading = (name: string | RegExp) => page.getByRole('heading', { level: 1, name });
const mainNav = () => page.getByRole('navigation', { name: 'Main' });

async function openMembers(): Promise<void> {
  await mainNav().getByRole('link', { name: 'Members' }).click();
  console.log('T', (performance.now()/1000).toFixed(2), "await mainNav().getByRole('link', { name: 'Members' }).click");
  await heading('Members').waitFor();
  console.log('T', (performance.now()/1000).toFixed(2), "await heading('Members').waitFor();");
  await page.getByRole('table').waitFor();
  console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('table').waitFor();");
}

describe('a new studio and its first editor', () => {
  it('sets up a new studio whose owner is the person who signed up', async () => {
    await page.goto(`${appUrl}/sign-up`);
    console.log('T', (performance.now()/1000).toFixed(2), 'await page.goto(`${appUrl}/sign-up`);');
    await heading('Set up your studio').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('Set up your studio').waitFor();");
    await page.getByLabel('Your name').fill(owner.name);
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('Your name').fill(owner.name);");
    await page.getByLabel('E-mail address').fill(owner.email);
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('E-mail address').fill(owner.email);");
    await page.getByLabel('Password', { exact: true }).fill(owner.password);
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('Password', { exact: true }).fill(owne");
    await page.getByLabel('Studio name').fill(studioName);
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('Studio name').fill(studioName);");
    await page.getByRole('button', { name: 'Create studio' }).click();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('button', { name: 'Create studio' }).cl");

    await page.waitForURL((url) => url.pathname === '/');
    console.log('T', (performance.now()/1000).toFixed(2), "await page.waitForURL((url) => url.pathname === '/');");
    await heading('Welcome, Mara').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('Welcome, Mara').waitFor();");
    expect(await page.getByText(`You are in ${studioName} as owner.`).isVisible()).toBe(true);
    await browser.screenshot(page, 'foundation-01-owner-home');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-01-owner-home');");
  });

  it('lets the owner invite an editor by e-mail from the members page', async () => {
    await openMembers();
    console.log('T', (performance.now()/1000).toFixed(2), 'await openMembers();');
    // The owner's editing controls are there: the same checks show them missing for a reviewer.
    await page.getByRole('heading', { name: 'Invite someone' }).waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('heading', { name: 'Invite someone' }).");
    expect(await page.getByRole('combobox', { name: `Role of ${owner.name}` }).count()).toBe(1);
    expect(await page.getByRole('button', { name: `Leave ${owner.name}` }).count()).toBe(1);

    await page.getByLabel('E-mail address').fill(editor.email);
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('E-mail address').fill(editor.email);");
    await page.getByLabel('Role', { exact: true }).selectOption('editor');
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('Role', { exact: true }).selectOption(");
    await page.getByRole('button', { name: 'Send invitation' }).click();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('button', { name: 'Send invitation' }).");

    const sent = page.getByRole('status').filter({ hasText: `Invitation sent to ${editor.email}` });
    await sent.waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), 'await sent.waitFor();');
    const waiting = page.getByRole('listitem').filter({ hasText: editor.email });
    expect(await waiting.innerText()).toContain('Editor · invited by Mara Quill');
    await browser.screenshot(page, 'foundation-02-invitation-sent');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-02-invitation-sen");
  });

  it('lets the invited person open the e-mailed link, create an account and join as editor', async () => {
    const link = await linkFromInbox(inboxUrl, appUrl, editor.email, /invited you to/);
    expect(new URL(link).pathname).toMatch(/^\/invitations\/[^/]+$/);

    // Still signed in as the owner: the page says the invitation is for someone else.
    await page.goto(link);
    console.log('T', (performance.now()/1000).toFixed(2), 'await page.goto(link);');
    await heading(`Join ${studioName}`).waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), 'await heading(`Join ${studioName}`).waitFor();');
    await page.getByText('This invitation is for someone else').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByText('This invitation is for someone else').");
    await page.getByRole('button', { name: 'Sign out' }).click();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('button', { name: 'Sign out' }).click()");

    await page.getByRole('heading', { name: 'Create your account' }).waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('heading', { name: 'Create your account");
    const invitationFacts = await page.locator('dl').innerText();
    expect(invitationFacts).toContain('Editor · Imports originals');
    expect(invitationFacts).toContain(editor.email);
    await browser.screenshot(page, 'foundation-03-invitation-new-account');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-03-invitation-new");
    await page.getByLabel('Your name').fill(editor.name);
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('Your name').fill(editor.name);");
    await page.getByLabel('Password', { exact: true }).fill(editor.password);
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('Password', { exact: true }).fill(edit");
    await page.getByRole('button', { name: 'Create account and join' }).click();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('button', { name: 'Create account and j");

    await page.waitForURL((url) => url.pathname === '/');
    console.log('T', (performance.now()/1000).toFixed(2), "await page.waitForURL((url) => url.pathname === '/');");
    await heading('Welcome, Oskar').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('Welcome, Oskar').waitFor();");
    expect(await page.getByText(`You are in ${studioName} as editor.`).isVisible()).toBe(true);
    await browser.screenshot(page, 'foundation-04-editor-home');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-04-editor-home');");
  });

  it('does not let the same invitation link be used twice', async () => {
    const link = await linkFromInbox(inboxUrl, appUrl, editor.email, /invited you to/);
    await page.goto(link);
    console.log('T', (performance.now()/1000).toFixed(2), 'await page.goto(link);');
    const problem = page.getByRole('alert').filter({ hasText: 'This invitation cannot be used' });
    await problem.waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), 'await problem.waitFor();');
    await browser.screenshot(page, 'foundation-04b-invitation-used');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-04b-invitation-us");
    expect(await problem.innerText()).toMatch(/already|used/i);
    expect(await page.getByRole('button', { name: /join/i }).count()).toBe(0);
  });

  it('signs the new editor out and back in to the same studio, where editors cannot manage members', async () => {
    await page.goto(`${appUrl}/`);
    console.log('T', (performance.now()/1000).toFixed(2), 'await page.goto(`${appUrl}/`);');
    await heading('Welcome, Oskar').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('Welcome, Oskar').waitFor();");
    await signOut(page, editor.name);
    console.log('T', (performance.now()/1000).toFixed(2), 'await signOut(page, editor.name);');
    await signIn(page, appUrl, editor.email, editor.password);
    console.log('T', (performance.now()/1000).toFixed(2), 'await signIn(page, appUrl, editor.email, editor.password);');
    expect(await page.getByText(`You are in ${studioName} as editor.`).isVisible()).toBe(true);

    await openMembers();
    console.log('T', (performance.now()/1000).toFixed(2), 'await openMembers();');
    const ownerRow = page.getByRole('row').filter({ hasText: owner.email });
    expect(await ownerRow.innerText()).toContain('Owner');
    const editorRow = page.getByRole('row').filter({ hasText: editor.email });
    expect(await editorRow.innerText()).toContain('Editor');
    expect(await page.getByRole('heading', { name: 'Invite someone' }).count()).toBe(0);
    expect(await page.getByRole('combobox').count()).toBe(0);
    await browser.screenshot(page, 'foundation-05-editor-members');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-05-editor-members");
    await signOut(page, editor.name);
    console.log('T', (performance.now()/1000).toFixed(2), 'await signOut(page, editor.name);');
  });
});

describe('the demo reviewer', () => {
  it('sees the members page with no invite form, role choices or remove buttons', async () => {
    await signIn(page, appUrl, 'june@saltmarsh.test', demoPassword);
    console.log('T', (performance.now()/1000).toFixed(2), "await signIn(page, appUrl, 'june@saltmarsh.test', demoPasswo");
    expect(await page.getByText('You are in Saltmarsh Studio as reviewer.').isVisible()).toBe(true);

    await openMembers();
    console.log('T', (performance.now()/1000).toFixed(2), 'await openMembers();');
    await page.getByRole('row').filter({ hasText: 'ines@saltmarsh.test' }).waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('row').filter({ hasText: 'ines@saltmars");
    expect(await page.getByText('Only owners invite people and change roles.').isVisible()).toBe(true);
    expect(await page.getByRole('heading', { name: 'Invite someone' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Send invitation' }).count()).toBe(0);
    expect(await page.getByRole('combobox').count()).toBe(0);
    expect(await page.getByRole('button', { name: /^(Remove|Leave|Withdraw)\b/ }).count()).toBe(0);
    await browser.screenshot(page, 'foundation-06-reviewer-members');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-06-reviewer-membe");
  });

  it('sees the studio settings read-only', async () => {
    await mainNav().getByRole('link', { name: 'Settings' }).click();
    console.log('T', (performance.now()/1000).toFixed(2), "await mainNav().getByRole('link', { name: 'Settings' }).clic");
    await heading('Settings').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('Settings').waitFor();");
    await page.getByText('Only owners change these settings.').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByText('Only owners change these settings.').w");
    const studioNameValue = page.locator('dt', { hasText: 'Studio name' }).locator('xpath=following-sibling::dd');
    expect(await studioNameValue.innerText()).toBe('Saltmarsh Studio');
    expect(await page.getByRole('textbox').count()).toBe(0);
    expect(await page.getByRole('spinbutton').count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Save settings' }).count()).toBe(0);
    await browser.screenshot(page, 'foundation-07-reviewer-settings');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-07-reviewer-setti");
    await signOut(page, 'June Abara');
    console.log('T', (performance.now()/1000).toFixed(2), "await signOut(page, 'June Abara');");
  });
});

describe('signing in and resetting a password', () => {
  it("shows the server's message inline when the password is wrong", async () => {
    // The words the server answers with, so the page is checked against the API, not a copy.
    const answer = await signInThroughApi('ines@saltmarsh.test', 'not the right password');
    expect(answer.status).toBe(401);

    await page.goto(`${appUrl}/sign-in`);
    console.log('T', (performance.now()/1000).toFixed(2), 'await page.goto(`${appUrl}/sign-in`);');
    await fillSignIn(page, 'ines@saltmarsh.test', 'not the right password');
    console.log('T', (performance.now()/1000).toFixed(2), "await fillSignIn(page, 'ines@saltmarsh.test', 'not the right");
    const alert = page.getByRole('alert');
    await alert.waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), 'await alert.waitFor();');
    expect(await alert.innerText()).toBe(answer.message);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    // Focus moves to the message, so a keyboard or screen reader user lands on it.
    expect(await alert.evaluate((element) => element === document.activeElement)).toBe(true);
    await browser.screenshot(page, 'foundation-08-wrong-password');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-08-wrong-password");
  });

  it('resets a password through the e-mailed link, once, and signs in with the new one', async () => {
    const newPassword = 'tide tables at dawn';
    await page.goto(`${appUrl}/sign-in`);
    console.log('T', (performance.now()/1000).toFixed(2), 'await page.goto(`${appUrl}/sign-in`);');
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('link', { name: 'Forgot your password?'");
    await heading('Choose a new password').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('Choose a new password').waitFor();");
    await page.getByLabel('E-mail address').fill(editor.email);
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('E-mail address').fill(editor.email);");
    await page.getByRole('button', { name: 'Send the link' }).click();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('button', { name: 'Send the link' }).cl");
    await heading('Check your inbox').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('Check your inbox').waitFor();");

    const link = await linkFromInbox(inboxUrl, appUrl, editor.email, /Reset your Motifold password/);
    expect(new URL(link).pathname).toBe('/reset-password');
    await page.goto(link);
    console.log('T', (performance.now()/1000).toFixed(2), 'await page.goto(link);');
    await heading('Choose a new password').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('Choose a new password').waitFor();");
    await page.getByLabel('New password', { exact: true }).fill(newPassword);
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('New password', { exact: true }).fill(");
    await page.getByLabel('New password again').fill(newPassword);
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('New password again').fill(newPassword");
    await page.getByRole('button', { name: 'Save new password' }).click();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('button', { name: 'Save new password' }");
    await heading('Your password is changed').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('Your password is changed').waitFor();");
    await browser.screenshot(page, 'foundation-09-password-changed');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-09-password-chang");

    // The old password no longer opens the account; the new one does.
    expect((await signInThroughApi(editor.email, editor.password)).status).toBe(401);
    await signIn(page, appUrl, editor.email, newPassword);
    console.log('T', (performance.now()/1000).toFixed(2), 'await signIn(page, appUrl, editor.email, newPassword);');
    expect(await page.getByText(`You are in ${studioName} as editor.`).isVisible()).toBe(true);
    await signOut(page, editor.name);
    console.log('T', (performance.now()/1000).toFixed(2), 'await signOut(page, editor.name);');

    // The same link a second time: the server's "already used" message, and no form.
    await page.goto(link);
    console.log('T', (performance.now()/1000).toFixed(2), 'await page.goto(link);');
    await heading('Choose a new password').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('Choose a new password').waitFor();");
    await page.getByLabel('New password', { exact: true }).fill('another long password');
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('New password', { exact: true }).fill(");
    await page.getByLabel('New password again').fill('another long password');
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByLabel('New password again').fill('another lo");
    await page.getByRole('button', { name: 'Save new password' }).click();
    console.log('T', (performance.now()/1000).toFixed(2), "await page.getByRole('button', { name: 'Save new password' }");
    await heading('This link cannot be used').waitFor();
    console.log('T', (performance.now()/1000).toFixed(2), "await heading('This link cannot be used').waitFor();");
    expect(await page.getByRole('alert').innerText()).toContain('already been used');
    await browser.screenshot(page, 'foundation-10-reset-link-used');
    console.log('T', (performance.now()/1000).toFixed(2), "await browser.screenshot(page, 'foundation-10-reset-link-use");
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
