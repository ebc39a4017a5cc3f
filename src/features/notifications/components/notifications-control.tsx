import { useEffect, useId, useRef, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import type { Notification } from '@shared/contracts/notifications';
import { Button } from '../../../components/ui/button';
import { classNames } from '../../../components/ui/class-names';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useSession } from '../../auth/components/session';
import { useNotifications } from '../api/get-notifications';
import { useMarkAllNotificationsRead } from '../api/mark-all-notifications-read';
import { useMarkNotificationRead } from '../api/mark-notification-read';
import { NotificationSettingsForm } from './notification-settings-form';

const timeFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

// Notifications belong to a membership: someone who is in no studio yet has none.
export function NotificationsControl() {
  const me = useSession();
  return me.role ? <NotificationsPanelButton /> : null;
}

// The top bar's notices: a count of unread ones, and a panel (a disclosure, not a menu: it holds
// a list, buttons and settings) that Escape or a click elsewhere closes.
function NotificationsPanelButton() {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const navigate = useNavigate();
  const list = useNotifications();
  const markRead = useMarkNotificationRead();
  const markAll = useMarkAllNotificationsRead();
  const unread = list.data?.unreadCount ?? 0;

  useEffect(() => {
    if (!open) return;
    const onPointer = (event: PointerEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener('pointerdown', onPointer);
    return () => document.removeEventListener('pointerdown', onPointer);
  }, [open]);

  const openNotification = (n: Notification) => {
    if (!n.read) markRead.mutate({ id: n.id });
    setOpen(false);
    if (n.link) navigate(n.link);
  };

  return (
    <div
      ref={rootRef}
      className="relative"
      onKeyDown={(e) => {
        if (e.key === 'Escape' && open) {
          setOpen(false);
          buttonRef.current?.focus();
        }
      }}
    >
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        aria-label={unread ? `Notifications, ${unread} unread` : 'Notifications'}
        onClick={() => setOpen((v) => !v)}
        className={classNames('relative inline-flex min-h-10 items-center rounded-md px-2.5 text-ink hover:bg-sand/60', open && 'bg-sand/60')}
      >
        <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true" focusable="false">
          <path d="M10 3a4.5 4.5 0 0 0-4.5 4.5V11L4 14h12l-1.5-3V7.5A4.5 4.5 0 0 0 10 3Z" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round" />
          <path d="M8 16.5a2 2 0 0 0 4 0" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
        </svg>
        {unread > 0 && (
          <span aria-hidden="true" className="absolute top-1 right-0.5 min-w-5 rounded-full bg-rust px-1 text-center text-xs leading-5 font-bold text-paper">
            {unread > 99 ? '99+' : unread}
          </span>
        )}
      </button>
      <div
        id={panelId}
        hidden={!open}
        role="region"
        aria-label="Notifications"
        className="absolute top-full right-0 z-30 mt-2 w-80 max-w-[calc(100vw-2rem)] rounded-lg border border-sand bg-paper p-3 shadow-lifted"
      >
        <div className="mb-2 flex items-center justify-between gap-2">
          <p className="font-semibold text-ink">Notifications</p>
          <Button size="sm" variant="quiet" disabled={unread === 0} busy={markAll.isPending} onClick={() => markAll.mutate()}>Mark all read</Button>
        </div>
        {list.isPending ? <p className="text-sm text-ink-soft">Loading…</p> : list.isError ? (
          <p role="alert" className="text-sm text-rust">{errorMessageOf(list.error)}</p>
        ) : list.data.notifications.length === 0 ? (
          <p className="py-3 text-sm text-ink-soft">Nothing yet. Review requests, decisions and comments on your products show here.</p>
        ) : (
          <ul className="flex max-h-80 flex-col gap-1 overflow-y-auto">
            {list.data.notifications.map((n) => (
              <li key={n.id} className={classNames('flex items-start gap-2 rounded-md p-2', !n.read && 'bg-tide/8')}>
                <button type="button" onClick={() => openNotification(n)} className="min-w-0 flex-1 rounded-md text-left">
                  <span className={classNames('block text-sm text-ink', !n.read && 'font-semibold')}>
                    {!n.read && <span className="sr-only">Unread: </span>}
                    {n.title}
                  </span>
                  {n.body && <span className="block truncate text-sm text-ink-soft">{n.body}</span>}
                  <time dateTime={n.createdAt} className="block text-xs text-ink-soft">{timeFormat.format(new Date(n.createdAt))}</time>
                </button>
                {!n.read && (
                  <Button size="sm" variant="quiet" aria-label={`Mark read: ${n.title}`} onClick={() => markRead.mutate({ id: n.id })}>Read</Button>
                )}
              </li>
            ))}
          </ul>
        )}
        <div className="mt-3 border-t border-sand pt-3">{open && <NotificationSettingsForm />}</div>
      </div>
    </div>
  );
}
