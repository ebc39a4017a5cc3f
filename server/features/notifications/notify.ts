import { and, eq, inArray } from 'drizzle-orm';
import type { NotificationKind } from '../../../shared/contracts/notifications';
import type { Database } from '../../db/client';
import { memberships, notifications, users } from '../../db/schema/index';
import type { Mailer, OutgoingMail } from '../../lib/mail';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

export type NotificationMessage = {
  kind: NotificationKind;
  title: string;
  body: string;
  // an in-app path, e.g. /products/<id>?thread=<id>
  link: string;
  // builds the recipient's mail; the link is the full address of `link`
  mail: (to: { email: string; name: string }) => OutgoingMail;
};

// Writes the in-app rows inside the caller's transaction and returns the mails to send once it
// has committed. Only current members of the studio are notified, each per their own settings,
// and never the person who caused it.
export async function prepareNotifications(
  tx: Database | Tx,
  input: { studioId: string; recipientIds: readonly string[]; exceptUserId: string; message: NotificationMessage },
): Promise<OutgoingMail[]> {
  const ids = [...new Set(input.recipientIds)].filter((id) => id !== input.exceptUserId);
  if (!ids.length) return [];
  const recipients = await tx
    .select({ userId: users.id, email: users.email, name: users.name, byEmail: memberships.notifyByEmail, inApp: memberships.notifyInApp })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.studioId, input.studioId), inArray(memberships.userId, ids)));
  const { message } = input;
  const inApp = recipients.filter((r) => r.inApp);
  if (inApp.length) {
    await tx.insert(notifications).values(
      inApp.map((r) => ({ studioId: input.studioId, userId: r.userId, kind: message.kind, title: message.title, body: message.body, link: message.link })),
    );
  }
  return recipients.filter((r) => r.byEmail).map((r) => message.mail({ email: r.email, name: r.name }));
}

// Mail goes out after the change is saved; a mail server that is down must not undo or fail it.
export async function sendNotificationMails(mailer: Mailer, mails: readonly OutgoingMail[]): Promise<void> {
  await Promise.all(
    mails.map(async (mail) => {
      try {
        await mailer.send(mail);
      } catch (err) {
        console.error(`[mail] could not send “${mail.subject}”:`, err instanceof Error ? err.message : err);
      }
    }),
  );
}
