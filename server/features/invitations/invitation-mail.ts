import { escapeHtml, type OutgoingMail } from '../../lib/mail';

export function invitationMail(input: { to: string; studioName: string; inviterName: string; role: string; link: string; expiresAt: Date }): OutgoingMail {
  const until = input.expiresAt.toISOString().slice(0, 10);
  return {
    to: input.to,
    subject: `${input.inviterName} invited you to ${input.studioName} on Motifold`,
    text: `${input.inviterName} invited you to join ${input.studioName} on Motifold as ${input.role}.\n\nAccept the invitation here (valid until ${until}):\n\n${input.link}\n\nIf you were not expecting this, you can ignore it.\n`,
    html: `<p>${escapeHtml(input.inviterName)} invited you to join <strong>${escapeHtml(input.studioName)}</strong> on Motifold as ${escapeHtml(input.role)}.</p><p><a href="${escapeHtml(input.link)}">Accept the invitation</a> (valid until ${until}).</p><p>If you were not expecting this, you can ignore it.</p>`,
  };
}
