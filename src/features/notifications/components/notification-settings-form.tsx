import { Checkbox } from '../../../components/ui/checkbox';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useNotificationSettings } from '../api/get-notification-settings';
import { useUpdateNotificationSettings } from '../api/update-notification-settings';

// The member's own choice, per studio: mail, the list in the top bar, both or neither.
export function NotificationSettingsForm() {
  const settings = useNotificationSettings();
  const update = useUpdateNotificationSettings();
  if (settings.isPending) return <p className="text-sm text-ink-soft">Loading your settings…</p>;
  if (settings.isError) return <p role="alert" className="text-sm text-rust">{errorMessageOf(settings.error)}</p>;
  const value = update.isPending && update.variables ? { ...settings.data, ...update.variables } : settings.data;
  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className="mb-1 text-sm font-semibold text-ink">Tell me about reviews and comments</legend>
      <Checkbox label="By e-mail" checked={value.notifyByEmail} disabled={update.isPending} onChange={(e) => update.mutate({ notifyByEmail: e.target.checked })} />
      <Checkbox label="Here, in this list" checked={value.notifyInApp} disabled={update.isPending} onChange={(e) => update.mutate({ notifyInApp: e.target.checked })} />
      {update.isError && <p role="alert" className="text-sm font-semibold text-rust">{errorMessageOf(update.error)}</p>}
    </fieldset>
  );
}
