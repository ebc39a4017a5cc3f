import { Card } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { roleNames, roleSummaries } from '../../auth/components/role-words';
import { useSession } from '../../auth/components/session';
import { firstName } from '../../../lib/format';
import { NeedsAttentionCard } from '../../calendar/components/needs-attention-card';
import { NextSteps } from '../components/next-steps';
import { RoleAbilities } from '../components/role-abilities';

export function HomePage() {
  const me = useSession();
  const greeting = `Welcome, ${firstName(me.user.name)}`;

  if (!me.studio || !me.role) {
    return (
      <>
        <PageHeader title={greeting} />
        <EmptyState title="You are not in a studio right now">
          Ask a studio owner to invite you. When you accept their invitation, the studio opens here.
        </EmptyState>
      </>
    );
  }

  return (
    <>
      <PageHeader
        title={greeting}
        description={
          <>
            You are in <span className="font-semibold text-ink">{me.studio.name}</span> as{' '}
            {roleNames[me.role].toLowerCase()}.
          </>
        }
      />
      <div className="flex flex-col gap-8">
        <section aria-labelledby="next-steps-heading">
          <h2 id="next-steps-heading" className="mb-3 text-lg font-semibold">
            What you can do next
          </h2>
          <NextSteps role={me.role} />
        </section>
        <NeedsAttentionCard />
        <Card title={`Your role: ${roleNames[me.role]}`} description={roleSummaries[me.role]}>
          <RoleAbilities role={me.role} />
        </Card>
      </div>
    </>
  );
}
