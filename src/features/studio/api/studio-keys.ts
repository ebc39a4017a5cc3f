// Everything under 'studio' belongs to the current studio and is reset when it changes.
export const studioKeys = {
  all: ['studio'] as const,
  settings: () => [...studioKeys.all, 'settings'] as const,
  members: () => [...studioKeys.all, 'members'] as const,
};
