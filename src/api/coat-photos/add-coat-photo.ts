import { useMutation, useQueryClient } from '@tanstack/react-query';
import { coatPhotoResponseSchema, type PhotoSubject } from '../../../shared/schemas/coat-photo';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export interface AddCoatPhotoInput {
  coatId: number;
  file: File;
  subject: PhotoSubject;
  caption: string;
}

/** A photo is its own record beside the coat; the coat itself never changes. */
export async function addCoatPhoto({ coatId, file, subject, caption }: AddCoatPhotoInput) {
  const form = new FormData();
  form.set('subject', subject);
  form.set('caption', caption);
  form.set('file', file);
  const { photo } = await apiClient.postForm(`/api/coats/${coatId}/photos`, form, coatPhotoResponseSchema);
  return photo;
}

export function useAddCoatPhoto() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: addCoatPhoto, onSuccess: () => invalidate(queryClient, changedKeys.coatPhoto()) });
}
