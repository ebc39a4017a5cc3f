import { useMutation, useQueryClient } from '@tanstack/react-query';
import { templateSchema } from '@shared/templates/template-schema';
import type { templateInputFromDraft } from '@shared/templates/template-draft';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { productsKeys } from '../../products/api/products-keys';

type TemplateInput = ReturnType<typeof templateInputFromDraft>;

// A new studio template when `id` is absent, otherwise a change to an existing one.
export function saveTemplate({ id, template }: { id?: string; template: TemplateInput }) {
  return id
    ? apiRequest(`/templates/${encodeURIComponent(id)}`, { method: 'PUT', body: { template }, schema: templateSchema })
    : apiRequest('/templates', { method: 'POST', body: { template }, schema: templateSchema });
}

export function useSaveTemplate({ mutationConfig }: { mutationConfig?: MutationConfig<typeof saveTemplate> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: saveTemplate,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: productsKeys.templates() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
