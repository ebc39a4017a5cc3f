import { PageHeader } from '../../../components/ui/page-header';

export function OriginalsPage() {
  return <PageHeader title="Originals" description="Layered PSD files and flat images, kept exactly as uploaded." />;
}
