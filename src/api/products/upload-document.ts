import { useMutation, useQueryClient } from '@tanstack/react-query';
import { productResponseSchema, type documentKinds } from '../../../shared/schemas/product';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { productKeys } from './product-keys';

export type DocumentKind = (typeof documentKinds)[number];

export async function uploadDocument({ productId, kind, file }: { productId: number; kind: DocumentKind; file: File }) {
  const form = new FormData();
  form.set('kind', kind);
  form.set('file', file);
  const { product } = await apiClient.postForm(`/api/products/${productId}/documents`, form, productResponseSchema);
  return product;
}

export function useUploadDocument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadDocument,
    onSuccess: (product) => {
      queryClient.setQueryData(productKeys.detail(product.id), product);
      return invalidate(queryClient, changedKeys.product());
    },
  });
}
