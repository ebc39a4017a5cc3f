import { useEffect, useState } from 'react';
import { StatusMessage } from '../../components/ui/status-message';
import { useHealth } from '../../features/health/api/get-health';

const serviceWords = {
  database: 'saving and loading studio data',
  storage: 'uploading and opening files',
  mail: 'sending e-mail (invitations and password links)',
} as const;

// The check pings storage and mail, so it waits until the page's own requests (a screen of
// thumbnails) have had the connection first.
const FIRST_CHECK_AFTER_MS = 2500;

// Quiet unless something is down; a failed health check itself is not worth a banner.
export function ServiceNotice({ firstCheckAfterMs = FIRST_CHECK_AFTER_MS }: { firstCheckAfterMs?: number }) {
  const [due, setDue] = useState(firstCheckAfterMs <= 0);
  useEffect(() => {
    if (due) return;
    const timer = setTimeout(() => setDue(true), firstCheckAfterMs);
    return () => clearTimeout(timer);
  }, [due, firstCheckAfterMs]);
  const health = useHealth(due);
  if (!health.data || health.data.status === 'ok') return null;
  const down = (Object.keys(serviceWords) as Array<keyof typeof serviceWords>).filter(
    (service) => health.data.services[service] === 'down',
  );
  return (
    <div className="mx-auto w-full max-w-6xl px-4 pt-4 sm:px-6">
      <StatusMessage tone="warning" title="Part of Motifold is not answering right now">
        {down.length > 0 ? `Affected: ${down.map((service) => serviceWords[service]).join('; ')}.` : null} Your
        work so far is safe; try again in a few minutes.
      </StatusMessage>
    </div>
  );
}
