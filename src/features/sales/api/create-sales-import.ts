import { useMutation, useQueryClient } from '@tanstack/react-query';
import { salesImportSchema, type SalesImport, type SalesMappingInput } from '@shared/contracts/sales';
import { uploadRequest } from '../../../lib/upload-request';
import { salesKeys } from './sales-keys';

export function createSalesImport({ file, mapping, skipBadRows }: { file: File; mapping: SalesMappingInput; skipBadRows: boolean }) {
  const form = new FormData();
  form.append('mapping', JSON.stringify(mapping));
  form.append('skipBadRows', skipBadRows ? 'true' : 'false');
  form.append('file', file);
  return uploadRequest('/sales/imports', { form, schema: salesImportSchema });
}

export function useCreateSalesImport({ onSuccess }: { onSuccess?: (created: SalesImport) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSalesImport,
    onSuccess: async (created) => {
      onSuccess?.(created);
      return queryClient.invalidateQueries({ queryKey: salesKeys.all });
    },
  });
}
