import type { ProductDetail } from '../../../../shared/contracts/products';

// The product page's samples section (orders, photos, verdicts). Being built.
export function ProductSamplesSection(_props: { product: ProductDetail }) {
  return null;
}
