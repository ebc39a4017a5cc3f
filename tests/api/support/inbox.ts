type InboxMail = { id: string; subject: string; to: { address: string }[]; text: string; html: string };

// Reads the fake SMTP server's web inbox (maildev's JSON API).
export async function mailsTo(address: string, timeoutMs = 5000): Promise<InboxMail[]> {
  const inbox = process.env.MAIL_INBOX_URL;
  if (!inbox) throw new Error('MAIL_INBOX_URL is not set: the api test setup did not run');
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await fetch(`${inbox}/api/email`);
    const all = (await res.json()) as InboxMail[];
    const mine = all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
    if (mine.length || Date.now() > deadline) return mine;
    await new Promise((r) => setTimeout(r, 100));
  }
}

export function linkIn(mail: InboxMail, pattern: RegExp): string {
  const match = mail.text.match(pattern);
  if (!match) throw new Error(`no link matching ${pattern} in: ${mail.text}`);
  return match[0];
}
