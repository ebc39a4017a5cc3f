import { useMutation } from '@tanstack/react-query';
import { salesPreviewResponseSchema, type SalesMappingInput } from '@shared/contracts/sales';
import { uploadRequest } from '../../../lib/upload-request';

export function previewSalesImport({ file, mapping }: { file: File; mapping?: SalesMappingInput }) {
  const form = new FormData();
  if (mapping) form.append('mapping', JSON.stringify(mapping));
  form.append('file', file);
  return uploadRequest('/sales/imports/preview', { form, schema: salesPreviewResponseSchema });
}

export function usePreviewSalesImport() {
  return useMutation({ mutationFn: previewSalesImport });
}
