import { useNavigate } from 'react-router-dom';
import { Menu } from '../../components/ui/menu';
import { roleNames } from '../../features/auth/components/role-words';
import { useSession } from '../../features/auth/components/session';
import { useSwitchStudio } from '../../features/auth/api/switch-studio';
import { errorMessageOf } from '../../lib/use-form-errors';

// Shown only to people in more than one studio; everyone else sees the studio's name.
export function StudioSwitcher() {
  const me = useSession();
  const navigate = useNavigate();
  const switchStudio = useSwitchStudio({ mutationConfig: { onSuccess: () => navigate('/') } });
  const current = me.studio;

  if (me.studios.length < 2) {
    return current ? <span className="truncate font-semibold text-ink-soft">{current.name}</span> : null;
  }

  return (
    <div className="flex min-w-0 items-center gap-2">
      <Menu
        align="start"
        triggerLabel={`Studio: ${current?.name ?? 'none chosen'}. Switch studio`}
        trigger={
          <span className="flex min-w-0 flex-col items-start leading-tight">
            <span className="text-xs text-ink-soft">Studio</span>
            <span className="max-w-44 truncate font-semibold">
              {switchStudio.isPending ? 'Switching…' : (current?.name ?? 'Choose a studio')}
            </span>
          </span>
        }
        items={me.studios.map((studio) => ({
          id: studio.id,
          label: studio.name,
          hint: `Your role: ${roleNames[studio.role].toLowerCase()}`,
          checked: studio.id === current?.id,
          disabled: switchStudio.isPending,
          onSelect: () => {
            if (studio.id !== current?.id) switchStudio.mutate({ studioId: studio.id });
          },
        }))}
      />
      {switchStudio.isError && (
        <p role="alert" className="max-w-48 text-sm font-semibold text-rust">
          {errorMessageOf(switchStudio.error)}
        </p>
      )}
    </div>
  );
}
