// general to specific, so invalidating `lists()` refreshes every product list
export const productsKeys = {
  all: ['products'] as const,
  lists: () => [...productsKeys.all, 'list'] as const,
  detail: (id: string) => [...productsKeys.all, 'detail', id] as const,
  templates: () => [...productsKeys.all, 'templates'] as const,
};
