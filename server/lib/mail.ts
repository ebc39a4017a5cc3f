import nodemailer from 'nodemailer';
import type { AppConfig } from '../config';

export type OutgoingMail = { to: string; subject: string; text: string; html: string };
export type Mailer = { send(mail: OutgoingMail): Promise<void>; check(): Promise<boolean> };

export function createMailer(config: Pick<AppConfig, 'SMTP_URL' | 'MAIL_FROM'>): Mailer {
  const url = new URL(config.SMTP_URL);
  const local = url.hostname === '127.0.0.1' || url.hostname === 'localhost';
  const transport = nodemailer.createTransport({
    host: url.hostname,
    port: Number(url.port || (url.protocol === 'smtps:' ? 465 : 587)),
    secure: url.protocol === 'smtps:',
    // The local fake inbox speaks plain SMTP; real services negotiate TLS.
    ignoreTLS: local,
    auth: url.username ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } : undefined,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: config.MAIL_FROM, ...mail });
    },
    async check() {
      try {
        await transport.verify();
        return true;
      } catch {
        return false;
      }
    },
  };
}

// Names in mails come from users: escape them before they go into HTML.
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (ch) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[ch]!);
}
