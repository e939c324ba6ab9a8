import type { MediaDto } from '@covalent/shared-types';
import { useMutation } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';

/** Uploads one image (PNG, JPEG or WebP, checked by content on the server) to attach to an item. */
export function useUploadImage() {
  return useMutation<MediaDto, ApiRequestError, File>({
    mutationFn: (file) => {
      const form = new FormData();
      form.append('file', file);
      return apiClient.upload<MediaDto>(apiPaths.mediaImages, form);
    },
  });
}
