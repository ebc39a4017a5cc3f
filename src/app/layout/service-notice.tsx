import { StatusMessage } from '../../components/ui/status-message';
import { useHealth } from '../../features/health/api/get-health';

const serviceWords = {
  database: 'saving and loading studio data',
  storage: 'uploading and opening files',
  mail: 'sending e-mail (invitations and password links)',
} as const;

// Quiet unless something is down; a failed health check itself is not worth a banner.
export function ServiceNotice() {
  const health = useHealth();
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
