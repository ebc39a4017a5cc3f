import { useState } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import { can } from '@shared/auth/permissions';
import { Button, ButtonLink } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { LoadingState } from '../../../components/ui/spinner';
import { useSession } from '../../auth/components/session';
import { isImporting } from '../api/import-status';
import { useOriginal } from '../api/get-original';
import { useOriginals } from '../api/get-originals';
import { DeleteOriginalDialog } from '../components/delete-original-dialog';
import { ImportProgress } from '../components/import-progress';
import { ImportReport } from '../components/import-report';
import { isLayered, OriginalFacts } from '../components/original-facts';
import { OriginalMotifs } from '../components/original-motifs';
import { RecutDialog } from '../components/recut-dialog';

export function OriginalPage() {
  const { originalId = '' } = useParams();
  const me = useSession();
  const canImport = can(me.role, 'originals.import');
  const original = useOriginal(originalId);
  const originals = useOriginals();
  const navigate = useNavigate();
  const [recutting, setRecutting] = useState(false);
  const [deleting, setDeleting] = useState(false);

  if (original.isPending) {
    return (
      <>
        <PageHeader title="Original" />
        <LoadingState label="Loading the original…" />
      </>
    );
  }
  if (original.isError) {
    return (
      <>
        <PageHeader title="Original" />
        <ErrorState
          error={original.error}
          title="This original could not be loaded"
          onRetry={() => void original.refetch()}
          retrying={original.isRefetching}
        />
      </>
    );
  }

  const data = original.data;
  const previousName = originals.data?.originals.find((o) => o.id === data.previousOriginalId)?.name;
  const ready = data.status === 'ready';
  const gone = () => navigate('/originals', { replace: true });

  return (
    <>
      <PageHeader
        title={data.name}
        description={<ButtonLink to="/originals" variant="quiet" size="sm" className="-ml-3">← All originals</ButtonLink>}
        actions={
          canImport && (
            <div className="flex flex-wrap gap-2">
              {ready && (
                <>
                  {isLayered(data) && (
                    <Button variant="secondary" onClick={() => setRecutting(true)}>
                      Cut again…
                    </Button>
                  )}
                  <ButtonLink variant="secondary" to={`/originals?versionOf=${data.id}`}>
                    Upload a new version
                  </ButtonLink>
                </>
              )}
              {!isImporting(data) && (
                <Button variant="danger" onClick={() => setDeleting(true)}>
                  Delete…
                </Button>
              )}
            </div>
          )
        }
      />
      <div className="flex flex-col gap-6">
        <Card>
          <OriginalFacts original={data} previousName={previousName} />
        </Card>
        {!ready && <ImportProgress original={data} canImport={canImport} onDeleted={gone} />}
        {data.report && (
          <Card title="Import report" description={isLayered(data) ? 'What became of each layer in the file.' : 'How the file was read, and what was left out.'}>
            <ImportReport report={data.report} layered={isLayered(data)} />
          </Card>
        )}
        {ready && (
          <Card title="Motifs" description={motifsDescription(data)}>
            <OriginalMotifs motifs={data.motifs} />
          </Card>
        )}
      </div>
      {canImport && ready && <RecutDialog original={data} open={recutting} onClose={() => setRecutting(false)} />}
      <DeleteOriginalDialog original={deleting ? data : null} onClose={() => setDeleting(false)} onDeleted={gone} />
    </>
  );
}

// A layered file gives a motif per layer or group; a flat image or drawing is one picture.
function motifsDescription(original: Parameters<typeof isLayered>[0] & { motifs: unknown[] }): string {
  if (isLayered(original)) return `${original.motifs.length} cut from this original, in the order of its layers.`;
  return original.motifs.length > 0 ? 'The whole picture is one motif.' : 'The picture has no visible pixels, so it gave no motif.';
}
