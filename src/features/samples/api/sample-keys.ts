// Everything under 'samples' belongs to the current studio (dropped when the session changes).
export const sampleKeys = {
  all: ['samples'] as const,
  lists: () => [...sampleKeys.all, 'list'] as const,
  forProduct: (productId: string) => [...sampleKeys.lists(), productId] as const,
};
