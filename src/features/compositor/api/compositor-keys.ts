export const compositorKeys = {
  all: ['compositor'] as const,
  tray: (q: string) => [...compositorKeys.all, 'tray', q] as const,
  originals: () => [...compositorKeys.all, 'originals'] as const,
  original: (id: string) => [...compositorKeys.all, 'original', id] as const,
  // by saved revision: the server checks what was saved, so each save asks again
  preflight: (productId: string, revision: number) => [...compositorKeys.all, 'preflight', productId, revision] as const,
  softProof: (productId: string, revision: number, mask: boolean) => [...compositorKeys.all, 'soft-proof', productId, revision, mask] as const,
  guideImage: (url: string) => [...compositorKeys.all, 'guide-image', url] as const,
};
