import { ButtonLink } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page-header';

export function NotFoundPage() {
  return (
    <div>
      <PageHeader title="Nothing here" description="This address does not lead to a page in Motifold. It may have moved, or the link may be cut short." />
      <ButtonLink to="/">Go to your studio home</ButtonLink>
    </div>
  );
}
