import type { ProductDetail } from '../../../../shared/contracts/products';

// The product page's review section (pinned comment threads, approvals). Being built.
export function ProductReviewSection(_props: { product: ProductDetail }) {
  return null;
}
