import { escapeHtml, type OutgoingMail } from '../../lib/mail';

export function passwordResetMail(to: string, name: string, link: string, ttlMinutes: number): OutgoingMail {
  return {
    to,
    subject: 'Reset your Motifold password',
    text: `Hello ${name},\n\nSomeone (hopefully you) asked to reset the password of your Motifold account.\nChoose a new password here within ${ttlMinutes} minutes:\n\n${link}\n\nThe link works once. If you did not ask for this, ignore this message: your password stays as it is.\n`,
    html: `<p>Hello ${escapeHtml(name)},</p><p>Someone (hopefully you) asked to reset the password of your Motifold account. Choose a new password within ${ttlMinutes} minutes:</p><p><a href="${escapeHtml(link)}">Choose a new password</a></p><p>The link works once. If you did not ask for this, ignore this message: your password stays as it is.</p>`,
  };
}
