import type { Layout } from '@shared/scene';
import { productDetailSchema } from '@shared/contracts/products';
import { apiRequest } from '../../../lib/api-client';

// Called by the editor's autosave (not a hook): it decides when to save and reads 409s itself.
export function updateProduct({ id, revision, layout, name }: { id: string; revision: number; layout?: Layout; name?: string }) {
  return apiRequest(`/products/${encodeURIComponent(id)}`, { method: 'PATCH', body: { revision, layout, name }, schema: productDetailSchema });
}
