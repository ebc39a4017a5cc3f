import { useParams } from 'react-router-dom';
import { can } from '@shared/auth/permissions';
import { Badge } from '../../../components/ui/badge';
import { ButtonLink } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { LoadingState } from '../../../components/ui/spinner';
import { useSession } from '../../auth/components/session';
import { MotifSalesSection } from '../../sales/components/motif-sales-section';
import { rightsWords } from '../../library/rights-words';
import { useMotif } from '../api/get-motif';
import { ColourSwatches } from '../components/colour-swatches';
import { LooksLikeStrip } from '../components/looks-like-strip';
import { MotifActions } from '../components/motif-actions';
import { MotifCollections } from '../components/motif-collections';
import { MotifFacts } from '../components/motif-facts';
import { RenameMotif } from '../components/motif-name';
import { MotifNotes } from '../components/motif-notes';
import { MotifTagsEditor } from '../components/motif-tags-editor';
import { RightsPanel } from '../components/rights-panel';
import { UsageTable } from '../components/usage-table';
import { VersionsPanel } from '../components/versions-panel';
import { ZoomablePreview } from '../components/zoomable-preview';

function TagList({ tags }: { tags: string[] }) {
  if (tags.length === 0) return <p className="text-ink-soft">No tags yet.</p>;
  return (
    <ul className="flex flex-wrap gap-1.5">
      {tags.map((tag) => (
        <li key={tag} className="rounded-full border border-tide/40 bg-tide/10 px-2.5 py-0.5 text-sm break-all text-tide-deep">
          {tag}
        </li>
      ))}
    </ul>
  );
}

export function MotifPage() {
  const { motifId = '' } = useParams();
  const me = useSession();
  const canEdit = can(me.role, 'motifs.edit');
  const motif = useMotif(motifId);
  const back = (
    <ButtonLink to="/library" variant="quiet" size="sm" className="-ml-3">
      ← Library
    </ButtonLink>
  );

  if (motif.isPending) {
    return (
      <>
        <PageHeader title="Motif" description={back} />
        <LoadingState label="Loading the motif…" />
      </>
    );
  }
  if (motif.isError) {
    return (
      <>
        <PageHeader title="Motif" description={back} />
        <ErrorState error={motif.error} title="This motif could not be loaded" onRetry={() => void motif.refetch()} retrying={motif.isRefetching} />
      </>
    );
  }

  const data = motif.data;
  return (
    <>
      <PageHeader
        title={data.name}
        description={
          <div className="flex flex-wrap items-center gap-2">
            {back}
            <Badge tone={rightsWords[data.rights.status].tone}>{rightsWords[data.rights.status].label}</Badge>
            {data.archived && <Badge tone="ochre">Archived</Badge>}
            {data.hiddenInOriginal && <Badge>Hidden in the original</Badge>}
            <span className="text-base text-ink-soft">Version {data.version}</span>
          </div>
        }
        actions={canEdit && <RenameMotif key={data.name} motif={data} />}
      />
      {/* Narrow screens read the left column first: picture, facts, use, versions. */}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] lg:items-start">
        <div className="flex min-w-0 flex-col gap-6">
          <Card>
            <ZoomablePreview src={data.imageUrl} width={data.width} height={data.height} name={data.name} />
            <div className="mt-4">
              <MotifActions motif={data} canEdit={canEdit} />
            </div>
          </Card>
          <Card title="Details">
            <MotifFacts motif={data} />
          </Card>
          <Card title="Where it is used" description="Every product placement of this motif, with the version it uses.">
            <UsageTable usage={data.usage} currentVersion={data.version} />
          </Card>
          <MotifSalesSection motifId={data.id} />
          <Card title="Versions" description="Earlier versions stay readable; products keep theirs until updated.">
            <VersionsPanel key={data.versions.length} motif={data} canEdit={canEdit} />
          </Card>
          <Card title="Looks like" description="Other motifs with nearly the same picture.">
            <LooksLikeStrip motifId={data.id} />
          </Card>
        </div>
        <div className="flex min-w-0 flex-col gap-6">
          <Card title="Main colours" description="Share of the motif's visible pixels. Choose one to find motifs in that colour.">
            <ColourSwatches colours={data.colours} />
          </Card>
          <Card title="Tags">
            {canEdit ? <MotifTagsEditor motif={data} /> : <TagList tags={data.tags} />}
          </Card>
          <Card title="Collections">
            <MotifCollections motif={data} canEdit={canEdit} />
          </Card>
          <Card title="Notes">
            <MotifNotes motif={data} canEdit={canEdit} />
          </Card>
          <Card title="Rights" description="Whether and how this artwork may be used.">
            <RightsPanel motif={data} canEdit={canEdit} />
          </Card>
        </div>
      </div>
    </>
  );
}
