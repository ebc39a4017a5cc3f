import { useState } from 'react';
import type { MotifDetail, MotifVersion } from '@shared/contracts/motifs';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { checkerboardStyle } from '../../../components/ui/checkerboard';
import { StatusMessage } from '../../../components/ui/status-message';
import { formatDay } from '../../../lib/format';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { formatBytes } from '../../originals/file-check';
import { useRestoreMotifVersion } from '../api/restore-motif-version';
import { MotifThumbnail } from './motif-thumbnail';

// The two versions compared first: the current one and the one before it.
export function defaultComparison(versions: readonly MotifVersion[]): number[] {
  const current = versions.find((v) => v.current) ?? versions[0];
  const other = versions.find((v) => v !== current);
  return current && other ? [other.version, current.version].sort((a, b) => a - b) : [];
}

function CompareSide({ version }: { version: MotifVersion }) {
  return (
    <figure className="flex min-w-0 flex-col gap-2">
      <div className="flex aspect-square items-center justify-center overflow-hidden rounded-lg border border-sand p-3" style={checkerboardStyle(12)}>
        <img src={version.imageUrl} alt="" className="max-h-full max-w-full object-contain" loading="lazy" />
      </div>
      <figcaption className="text-sm text-ink">
        <span className="font-semibold">Version {version.version}</span>
        {version.current && ' (current)'} · {version.width} × {version.height} px
      </figcaption>
    </figure>
  );
}

export function VersionsPanel({ motif, canEdit }: { motif: MotifDetail; canEdit: boolean }) {
  const versions = motif.versions;
  const [compare, setCompare] = useState<number[]>(() => defaultComparison(versions));
  const restore = useRestoreMotifVersion();

  if (versions.length <= 1) {
    return <p className="text-ink-soft">Only one version so far. A changed layer in a new upload of its original adds the next one.</p>;
  }
  const toggle = (version: number) =>
    setCompare((chosen) =>
      chosen.includes(version) ? chosen.filter((v) => v !== version) : [...chosen.slice(-1), version].sort((a, b) => a - b),
    );
  const compared = compare.map((n) => versions.find((v) => v.version === n)).filter((v): v is MotifVersion => Boolean(v));

  return (
    <div className="flex flex-col gap-5">
      <ul className="flex flex-col divide-y divide-sand">
        {versions.map((version) => (
          <li key={version.version} className="flex flex-wrap items-center gap-3 py-2.5">
            <MotifThumbnail src={version.thumbUrl} className="w-16 shrink-0" cell={6} />
            <div className="min-w-0 flex-1">
              <p className="flex flex-wrap items-center gap-2 font-semibold text-ink">
                Version {version.version}
                {version.current && <Badge tone="kelp">Current</Badge>}
                {version.samePixelsAs !== null && <Badge>Same pixels as version {version.samePixelsAs}</Badge>}
              </p>
              <p className="text-sm text-ink-soft">
                {version.width} × {version.height} px · {formatBytes(version.pngBytes)} · from {version.originalName} · {formatDay(version.createdAt)}
              </p>
            </div>
            <label className="flex items-center gap-2 text-sm text-ink">
              <input type="checkbox" className="size-4 accent-tide" checked={compare.includes(version.version)} onChange={() => toggle(version.version)} />
              Compare
            </label>
            {canEdit && !version.current && (
              <Button
                size="sm"
                variant="secondary"
                busy={restore.isPending && restore.variables?.version === version.version}
                busyLabel="Restoring…"
                onClick={() => restore.mutate({ id: motif.id, version: version.version })}
              >
                Make current again
              </Button>
            )}
          </li>
        ))}
      </ul>
      {restore.isError && <StatusMessage tone="problem">{errorMessageOf(restore.error)}</StatusMessage>}
      {restore.isSuccess && <StatusMessage tone="ok">Version {restore.variables.version} is current again, as a new version; nothing was lost.</StatusMessage>}
      {compared.length === 2 ? (
        <section aria-label="Versions side by side" className="grid grid-cols-2 gap-4">
          {compared.map((version) => (
            <CompareSide key={version.version} version={version} />
          ))}
        </section>
      ) : (
        <p className="text-sm text-ink-soft">Tick two versions to see them side by side.</p>
      )}
    </div>
  );
}
