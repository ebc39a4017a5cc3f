// One table decides what each studio role may do; the server's `requirePermission` middleware
// and the client's `can()` both read it, and the README's role table is generated from it.
export const studioRoles = ['owner', 'editor', 'reviewer'] as const;
export type StudioRole = (typeof studioRoles)[number];

export const permissionTable = {
  'studio.read': { label: 'See the studio, its library and products', roles: ['owner', 'editor', 'reviewer'] },
  'studio.manage': { label: 'Change studio settings', roles: ['owner'] },
  'members.read': { label: 'See members and pending invitations', roles: ['owner', 'editor', 'reviewer'] },
  'members.manage': { label: 'Invite, change roles, remove members', roles: ['owner'] },
  'originals.import': { label: 'Upload and re-cut originals', roles: ['owner', 'editor'] },
  'motifs.edit': { label: 'Tag, rename, archive and delete motifs', roles: ['owner', 'editor'] },
  'products.compose': { label: 'Create products and edit layouts', roles: ['owner', 'editor'] },
  'exports.create': { label: 'Export print files and proof sheets', roles: ['owner', 'editor'] },
  'reviews.comment': { label: 'Comment on products', roles: ['owner', 'editor', 'reviewer'] },
  'reviews.decide': { label: 'Approve a product or ask for changes', roles: ['owner', 'reviewer'] },
  'reviews.resolve': { label: 'Resolve comment threads and ask for reviews', roles: ['owner', 'editor'] },
  'stages.move': { label: 'Move products between stages, edit variants and SKUs', roles: ['owner', 'editor'] },
  'stages.override': { label: 'Move a product to ready without an approved sample', roles: ['owner'] },
  'samples.record': { label: 'Record sample orders, photos and verdicts', roles: ['owner', 'editor'] },
  'sales.import': { label: 'Import sales files from the shop', roles: ['owner', 'editor', 'reviewer'] },
  'studio.data': { label: 'Export the studio\'s data and import it into an empty studio', roles: ['owner'] },
} as const satisfies Record<string, { label: string; roles: readonly StudioRole[] }>;

export type Permission = keyof typeof permissionTable;
export const permissions = Object.keys(permissionTable) as Permission[];

export function can(role: StudioRole | null | undefined, permission: Permission): boolean {
  if (!role) return false;
  return (permissionTable[permission].roles as readonly StudioRole[]).includes(role);
}
