import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { productQueryOptions } from '../api/get-product';
import { productStagesQueryOptions } from '../api/get-product-stages';
import { productVariantsQueryOptions } from '../api/get-product-variants';
import { productsQueryOptions } from '../api/get-products';

export const productsLoader = (queryClient: QueryClient) => async () => {
  await queryClient.prefetchQuery(productsQueryOptions());
  return null;
};

export const productLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = params.productId;
    if (id) {
      await Promise.all([
        queryClient.prefetchQuery(productQueryOptions(id)),
        queryClient.prefetchQuery(productStagesQueryOptions(id)),
        queryClient.prefetchQuery(productVariantsQueryOptions(id)),
      ]);
    }
    return null;
  };
