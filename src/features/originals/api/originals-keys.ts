// Everything under 'originals' belongs to the current studio (dropped when the session changes).
export const originalsKeys = {
  all: ['originals'] as const,
  lists: () => [...originalsKeys.all, 'list'] as const,
  details: () => [...originalsKeys.all, 'detail'] as const,
  detail: (id: string) => [...originalsKeys.details(), id] as const,
};
