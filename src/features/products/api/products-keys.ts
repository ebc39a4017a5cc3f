// general to specific, so invalidating `lists()` refreshes every product list
export const productsKeys = {
  all: ['products'] as const,
  lists: () => [...productsKeys.all, 'list'] as const,
  detail: (id: string) => [...productsKeys.all, 'detail', id] as const,
  stages: (id: string) => [...productsKeys.all, 'detail', id, 'stages'] as const,
  variants: (id: string) => [...productsKeys.all, 'detail', id, 'variants'] as const,
  templates: () => [...productsKeys.all, 'templates'] as const,
};
