import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { coatPhotoSchema, type PhotoSubject } from '../../../../shared/schemas/coat-photo';
import { apiClient } from '../../../lib/api-client';
import { coatLogKeys } from './coat-log-keys';

const responseSchema = z.object({ photo: coatPhotoSchema });

export async function addCoatPhoto({ coatId, file, subject, caption }: { coatId: number; file: File; subject: PhotoSubject; caption: string }) {
  const form = new FormData();
  form.set('subject', subject);
  form.set('caption', caption);
  form.set('file', file);
  return (await apiClient.postForm(`/api/coats/${coatId}/photos`, form, responseSchema)).photo;
}

export function useAddCoatPhoto() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: addCoatPhoto, onSuccess: () => queryClient.invalidateQueries({ queryKey: coatLogKeys.photos() }) });
}
