// general to specific: invalidating `product(id)` refreshes its threads and its review state
export const reviewsKeys = {
  all: ['reviews'] as const,
  product: (productId: string) => [...reviewsKeys.all, 'product', productId] as const,
  threads: (productId: string) => [...reviewsKeys.product(productId), 'threads'] as const,
  review: (productId: string) => [...reviewsKeys.product(productId), 'review'] as const,
};
