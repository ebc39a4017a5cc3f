import { can, permissions, permissionTable, type StudioRole } from '@shared/auth/permissions';

// Read straight from the permission table the server enforces, so this list cannot drift.
export function RoleAbilities({ role }: { role: StudioRole }) {
  const allowed = permissions.filter((permission) => can(role, permission));
  const notAllowed = permissions.filter((permission) => !can(role, permission));
  return (
    <div className="grid gap-6 sm:grid-cols-2">
      <div>
        <h3 className="mb-2 font-semibold">You can</h3>
        <ul className="flex flex-col gap-1.5">
          {allowed.map((permission) => (
            <li key={permission} className="flex gap-2">
              <span aria-hidden="true" className="mt-2 size-2 shrink-0 rounded-full bg-kelp" />
              {permissionTable[permission].label}
            </li>
          ))}
        </ul>
      </div>
      {notAllowed.length > 0 && (
        <div>
          <h3 className="mb-2 font-semibold">Left to other roles</h3>
          <ul className="flex flex-col gap-1.5 text-ink-soft">
            {notAllowed.map((permission) => (
              <li key={permission} className="flex gap-2">
                <span aria-hidden="true" className="mt-2 size-2 shrink-0 rounded-full border border-ink-soft/60" />
                {permissionTable[permission].label}
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}
