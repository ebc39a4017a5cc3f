export const compositorKeys = {
  all: ['compositor'] as const,
  tray: (q: string) => [...compositorKeys.all, 'tray', q] as const,
  originals: () => [...compositorKeys.all, 'originals'] as const,
  original: (id: string) => [...compositorKeys.all, 'original', id] as const,
};
