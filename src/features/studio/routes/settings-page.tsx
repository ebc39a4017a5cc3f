import { can } from '@shared/auth/permissions';
import { Card } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { LoadingState } from '../../../components/ui/spinner';
import { formatDay } from '../../../lib/format';
import { useSession } from '../../auth/components/session';
import { useStudio } from '../api/get-studio';
import { SettingsForm } from '../components/settings-form';
import { SettingsSummary } from '../components/settings-summary';
import { StudioDataCard } from '../components/studio-data-card';

export function SettingsPage() {
  const me = useSession();
  const studio = useStudio();
  const canManage = can(me.role, 'studio.manage');
  const header = (
    <PageHeader
      title="Settings"
      description={canManage ? 'How your studio works.' : 'How your studio works. Only owners change these settings.'}
    />
  );

  if (!me.studio) {
    return (
      <>
        {header}
        <EmptyState title="You are not in a studio right now">Settings show here once you join a studio.</EmptyState>
      </>
    );
  }
  if (studio.isPending) {
    return (
      <>
        {header}
        <LoadingState label="Loading settings…" />
      </>
    );
  }
  if (studio.isError) {
    return (
      <>
        {header}
        <ErrorState
          error={studio.error}
          title="Settings could not be loaded"
          onRetry={() => void studio.refetch()}
          retrying={studio.isRefetching}
        />
      </>
    );
  }

  return (
    <>
      {header}
      <Card title="Studio" description={`Set up on ${formatDay(studio.data.createdAt)}`}>
        {canManage ? (
          <SettingsForm key={studio.data.id} settings={studio.data} />
        ) : (
          <SettingsSummary settings={studio.data} />
        )}
      </Card>
      {can(me.role, 'studio.data') && (
        <div className="mt-6">
          <StudioDataCard />
        </div>
      )}
    </>
  );
}
