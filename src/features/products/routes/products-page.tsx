import { PageHeader } from '../../../components/ui/page-header';

export function ProductsPage() {
  return <PageHeader title="Products" description="What your studio sells: a template, a layout of motifs, and its stage." />;
}
