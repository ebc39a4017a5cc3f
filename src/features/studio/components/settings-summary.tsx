import type { StudioSettings } from '@shared/contracts/studio';
import { settingWords } from './setting-words';

export function SettingsSummary({ settings }: { settings: StudioSettings }) {
  const rows = [
    { key: 'name', value: settings.name },
    { key: 'paletteLimit', value: `${settings.paletteLimit} colour groups` },
    {
      key: 'readyWeeksBeforeLaunch',
      value: `${settings.readyWeeksBeforeLaunch} ${settings.readyWeeksBeforeLaunch === 1 ? 'week' : 'weeks'}`,
    },
  ] as const;
  return (
    <dl className="flex max-w-xl flex-col divide-y divide-sand">
      {rows.map((row) => (
        <div key={row.key} className="grid gap-1 py-3 sm:grid-cols-[12rem_1fr] sm:gap-4">
          <dt className="font-semibold">{settingWords[row.key].label}</dt>
          <dd>
            <span className="text-ink">{row.value}</span>
            {settingWords[row.key].meaning && (
              <span className="block text-sm text-ink-soft">{settingWords[row.key].meaning}</span>
            )}
          </dd>
        </div>
      ))}
    </dl>
  );
}
