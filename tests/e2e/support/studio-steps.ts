import type { Page } from 'playwright-core';
import { openBrowser, type OpenBrowser, type OpenBrowserOptions } from './browser';
import { waitForMail } from '../../../scripts/services/fake-mail';

export const demoPassword = 'saltmarsh-demo';

export type Person = { name: string; email: string; password: string };

/** A person nobody has seen before in this run: a fresh address each time. */
export function newPerson(name: string, tag: string): Person {
  const unique = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
  return { name, email: `${tag}-${unique}@e2e.test`, password: 'a long enough test password' };
}

export async function signIn(page: Page, appUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${appUrl}/sign-in`);
  await fillSignIn(page, email, password);
  await page.waitForURL((url) => url.pathname === '/');
  await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
}

/** A fresh browser with one page, signed in as a demo person: the usual start of a browser test file. */
export async function openSignedIn(
  appUrl: string,
  email: string,
  { viewport, timeout = 15_000 }: OpenBrowserOptions & { timeout?: number } = {},
): Promise<{ browser: OpenBrowser; page: Page }> {
  const browser = await openBrowser({ viewport });
  try {
    const page = await browser.newPage();
    page.setDefaultTimeout(timeout);
    await signIn(page, appUrl, email, demoPassword);
    return { browser, page };
  } catch (error) {
    await browser.close();
    throw error;
  }
}

export async function fillSignIn(page: Page, email: string, password: string): Promise<void> {
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
}

export async function signOut(page: Page, name: string): Promise<void> {
  await page.getByRole('button', { name: `Your account: ${name}` }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.waitForURL((url) => url.pathname === '/sign-in');
  await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
}

/** Waits for a mail to `to` whose subject matches, and returns the first app link in its text. */
export async function linkFromInbox(inboxUrl: string, appUrl: string, to: string, subject: RegExp): Promise<string> {
  const mail = await waitForMail(
    inboxUrl,
    (m) => m.to.some((a) => a.address.toLowerCase() === to.toLowerCase()) && subject.test(m.subject),
  );
  const escapedOrigin = appUrl.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const link = mail.text?.match(new RegExp(`${escapedOrigin}/\\S+`))?.[0];
  if (!link) throw new Error(`the mail "${mail.subject}" to ${to} holds no link into ${appUrl}`);
  return link;
}
