import { useNavigate } from 'react-router-dom';
import { Menu } from '../../components/ui/menu';
import { useSignOut } from '../../features/auth/api/sign-out';
import { roleNames } from '../../features/auth/components/role-words';
import { useSession } from '../../features/auth/components/session';
import { initialsOf } from '../../lib/format';
import { errorMessageOf } from '../../lib/use-form-errors';

export function UserMenu() {
  const me = useSession();
  const navigate = useNavigate();
  const signOut = useSignOut({ mutationConfig: { onSuccess: () => navigate('/sign-in', { replace: true }) } });

  return (
    <div className="flex items-center gap-2">
      {signOut.isError && (
        <p role="alert" className="text-sm font-semibold text-rust">
          {errorMessageOf(signOut.error)}
        </p>
      )}
      <Menu
        triggerLabel={`Your account: ${me.user.name}`}
        trigger={
          <>
            <span
              aria-hidden="true"
              className="flex size-8 items-center justify-center rounded-full bg-tide text-sm font-semibold text-paper"
            >
              {initialsOf(me.user.name)}
            </span>
            <span className="hidden max-w-36 truncate font-semibold xl:inline">{me.user.name}</span>
          </>
        }
        header={
          <>
            <p className="font-semibold text-ink">{me.user.name}</p>
            <p className="truncate text-sm text-ink-soft">{me.user.email}</p>
            {me.studio && me.role && (
              <p className="mt-1 text-sm text-ink-soft">
                {roleNames[me.role]} in {me.studio.name}
              </p>
            )}
          </>
        }
        items={[
          { id: 'home', label: 'Studio home', onSelect: () => navigate('/') },
          { id: 'members', label: 'Members', onSelect: () => navigate('/members') },
          { id: 'settings', label: 'Studio settings', onSelect: () => navigate('/settings') },
          {
            id: 'sign-out',
            label: signOut.isPending ? 'Signing out…' : 'Sign out',
            disabled: signOut.isPending,
            onSelect: () => signOut.mutate(),
          },
        ]}
      />
    </div>
  );
}
