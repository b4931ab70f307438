import type { PhotoVariant } from '@wiretrail/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiBlob } from '@/lib/api-client';

/** One size of a photo from the server, as a Blob. A photo's sizes never change, so they are kept for the session. */
export const photoFileQueryOptions = (photoId: string, variant: PhotoVariant) =>
  queryOptions({
    queryKey: ['photos', photoId, variant],
    queryFn: ({ signal }) => apiBlob(`/photos/${encodeURIComponent(photoId)}/${variant}`, signal),
    staleTime: Number.POSITIVE_INFINITY,
    gcTime: variant === 'thumb' ? 30 * 60_000 : 5 * 60_000,
    refetchOnWindowFocus: false,
  });

export function usePhotoFile(photoId: string, variant: PhotoVariant, enabled = true) {
  return useQuery({ ...photoFileQueryOptions(photoId, variant), enabled });
}
