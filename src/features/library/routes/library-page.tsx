import { PageHeader } from '../../../components/ui/page-header';

export function LibraryPage() {
  return <PageHeader title="Library" description="Motifs cut from your originals, ready to place on products." />;
}
