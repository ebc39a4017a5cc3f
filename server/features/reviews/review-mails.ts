import { escapeHtml, type OutgoingMail } from '../../lib/mail';

type To = { email: string; name: string };

// Quoted text from members goes into HTML escaped; long bodies are cut for the mail only.
function quote(body: string): { text: string; html: string } {
  const short = body.length > 600 ? `${body.slice(0, 600)}…` : body;
  return { text: short.split('\n').map((l) => `> ${l}`).join('\n'), html: `<blockquote>${escapeHtml(short).replace(/\n/g, '<br>')}</blockquote>` };
}

function mail(to: To, subject: string, lead: string, body: string, linkLabel: string, link: string): OutgoingMail {
  const q = body ? quote(body) : null;
  return {
    to: to.email,
    subject,
    text: `Hello ${to.name},\n\n${lead}\n\n${q ? `${q.text}\n\n` : ''}${linkLabel}:\n\n${link}\n\nYou can turn these mails off in Motifold's notification settings.\n`,
    html: `<p>Hello ${escapeHtml(to.name)},</p><p>${escapeHtml(lead)}</p>${q ? q.html : ''}<p><a href="${escapeHtml(link)}">${escapeHtml(linkLabel)}</a></p><p>You can turn these mails off in Motifold's notification settings.</p>`,
  };
}

export function reviewRequestedMail(to: To, input: { requesterName: string; productName: string; note: string; link: string }): OutgoingMail {
  return mail(to, `${input.requesterName} asked you to review “${input.productName}”`, `${input.requesterName} asked you to review “${input.productName}”.`, input.note, 'Open the product', input.link);
}

export function reviewDecidedMail(to: To, input: { reviewerName: string; productName: string; approved: boolean; note: string; link: string }): OutgoingMail {
  const what = input.approved ? 'approved' : 'asked for changes to';
  return mail(to, `${input.reviewerName} ${what} “${input.productName}”`, `${input.reviewerName} ${what} “${input.productName}”.`, input.note, 'Open the product', input.link);
}

export function commentMail(to: To, input: { authorName: string; productName: string; body: string; reply: boolean; link: string }): OutgoingMail {
  const what = input.reply ? 'replied to a comment on' : 'commented on';
  return mail(to, `${input.authorName} ${what} “${input.productName}”`, `${input.authorName} ${what} “${input.productName}”:`, input.body, 'Open the comment', input.link);
}
