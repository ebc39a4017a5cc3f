import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import { MailDev } from 'maildev';
import { z } from 'zod';
import { ServiceError } from './service-error';

export interface FakeMailOptions {
  /** 0 picks a free port. */
  smtpPort: number;
  /** 0 picks a free port. */
  webPort: number;
  /** Where received mail is kept; without it maildev shares one folder in the OS temp dir. */
  mailDirectory?: string;
}

export interface RunningFakeMail {
  smtpUrl: string;
  inboxUrl: string;
  stop(): Promise<void>;
}

export async function startFakeMail(options: FakeMailOptions): Promise<RunningFakeMail> {
  const mailDirectory = options.mailDirectory ? path.resolve(options.mailDirectory) : undefined;
  if (mailDirectory) await mkdir(mailDirectory, { recursive: true });
  const maildev = new MailDev({
    smtp: options.smtpPort,
    ip: '127.0.0.1',
    web: options.webPort,
    webIp: '127.0.0.1',
    silent: true,
    mailDirectory,
  });
  const servers = await startQuietly(maildev, options);
  const smtpPort = servers.smtp.getAddress().port;
  const webPort = servers.api?.getAddress()?.port;
  if (!webPort) throw new ServiceError('mail.no_inbox', 'the local mail inbox did not start');
  return {
    smtpUrl: `smtp://127.0.0.1:${smtpPort}`,
    inboxUrl: `http://127.0.0.1:${webPort}`,
    stop: () => maildev.stop(),
  };
}

type MailDevServers = Awaited<ReturnType<MailDev['start']>>;

async function startQuietly(maildev: MailDev, options: FakeMailOptions): Promise<MailDevServers> {
  // maildev's web server announces itself with console.info even when silent
  const info = console.info;
  console.info = () => {};
  try {
    return await maildev.start();
  } catch (error) {
    await maildev.stop().catch(() => {});
    if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE') {
      throw new ServiceError(
        'mail.port_taken',
        `port ${options.smtpPort} (SMTP) or ${options.webPort} (inbox) for the local mail catcher is already in use (is another \`npm start\` or \`npm run dev\` running?); stop it, or set SMTP_URL and MAIL_INBOX_URL`,
      );
    }
    throw error;
  } finally {
    console.info = info;
  }
}

const addressSchema = z.object({ address: z.string(), name: z.string().optional() });

export const inboxMailSchema = z.object({
  id: z.string(),
  time: z.string().optional(),
  subject: z.string().default(''),
  from: z.array(addressSchema).default([]),
  to: z.array(addressSchema).default([]),
  // maildev reports a missing part as false
  text: z.string().optional().catch(undefined),
  html: z.string().optional().catch(undefined),
});

export type InboxMail = z.infer<typeof inboxMailSchema>;

/** Every mail the local mail catcher holds, oldest first. */
export async function readInbox(inboxUrl: string): Promise<InboxMail[]> {
  const response = await fetch(new URL('/api/email', inboxUrl));
  if (!response.ok) throw new ServiceError('mail.inbox_unreadable', `the mail inbox answered ${response.status}`);
  return z.array(inboxMailSchema).parse(await response.json());
}

/** Empties the inbox, so a test can look only at the mail it caused. */
export async function clearInbox(inboxUrl: string): Promise<void> {
  const response = await fetch(new URL('/api/email/all', inboxUrl), { method: 'DELETE' });
  if (!response.ok) throw new ServiceError('mail.inbox_unclearable', `the mail inbox answered ${response.status}`);
}

/** Polls the inbox until a mail matches (mail is often sent by a background job). */
export async function waitForMail(
  inboxUrl: string,
  matches: (mail: InboxMail) => boolean,
  timeoutMs = 10_000,
): Promise<InboxMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await readInbox(inboxUrl)).find(matches);
    if (found) return found;
    if (Date.now() > deadline) {
      throw new ServiceError('mail.not_received', `no matching mail arrived within ${timeoutMs} ms`);
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}
