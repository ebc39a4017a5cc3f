import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { can } from '@shared/auth/permissions';
import { Card } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { LoadingState } from '../../../components/ui/spinner';
import { useSession } from '../../auth/components/session';
import { useOriginals } from '../api/get-originals';
import { OriginalsTable } from '../components/originals-table';
import { UploadPanel } from '../components/upload-panel';
import { WatchedImport } from '../components/watched-import';

export function OriginalsPage() {
  const me = useSession();
  const canImport = can(me.role, 'originals.import');
  const originals = useOriginals();
  const [params] = useSearchParams();
  // Uploads made here, newest first, each followed until its import finishes.
  const [watched, setWatched] = useState<string[]>([]);
  const studioName = me.studio?.name ?? '';

  const list = originals.data?.originals ?? [];

  return (
    <>
      <PageHeader
        title="Originals"
        description={
          canImport
            ? 'Layered PSD files, flat images and SVG drawings, kept exactly as uploaded. Each one is cut into motifs for the library.'
            : 'Layered PSD files, flat images and SVG drawings, kept exactly as uploaded. Editors and owners upload them.'
        }
      />
      <div className="flex flex-col gap-6">
        {canImport && (
          <Card title="Add an original" description="Its layers become motifs: names, positions and looks kept.">
            <UploadPanel
              key={params.get('versionOf') ?? 'new'}
              originals={list}
              versionOf={params.get('versionOf')}
              onUploaded={(id) => setWatched((ids) => [id, ...ids.filter((x) => x !== id)])}
            />
            {watched.length > 0 && (
              <section aria-label="Imports started here" className="mt-5 flex flex-col gap-3">
                {watched.map((id) => (
                  <WatchedImport key={id} id={id} canImport={canImport} onGone={() => setWatched((ids) => ids.filter((x) => x !== id))} />
                ))}
              </section>
            )}
          </Card>
        )}
        <Card title="All originals" description={originals.data ? `${list.length} in ${studioName}` : undefined}>
          {originals.isPending ? (
            <LoadingState label="Loading originals…" />
          ) : originals.isError ? (
            <ErrorState
              error={originals.error}
              title="Originals could not be loaded"
              onRetry={() => void originals.refetch()}
              retrying={originals.isRefetching}
            />
          ) : list.length === 0 ? (
            <EmptyState title="No originals yet">
              {canImport ? 'Drop a layered PSD above to fill the library.' : 'Originals show here once an editor uploads them.'}
            </EmptyState>
          ) : (
            <OriginalsTable originals={list} studioName={studioName} />
          )}
        </Card>
      </div>
    </>
  );
}
