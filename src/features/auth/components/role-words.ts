import type { StudioRole } from '@shared/auth/permissions';

export const roleNames: Record<StudioRole, string> = {
  owner: 'Owner',
  editor: 'Editor',
  reviewer: 'Reviewer',
};

export const roleSummaries: Record<StudioRole, string> = {
  owner: 'Manages members and studio settings, and can do everything an editor does.',
  editor: 'Imports originals, cuts motifs, composes products and exports print files.',
  reviewer: 'Looks at products, comments, and approves them or asks for changes.',
};

export const roleOptions = (roles: readonly StudioRole[]) =>
  roles.map((role) => ({ value: role, label: roleNames[role] }));
