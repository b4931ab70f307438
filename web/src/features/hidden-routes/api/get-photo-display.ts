import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiBlob } from '@/lib/api-client';

/** A photo's display size from the server, to draw routes over where the device does not keep the photo itself. */
export const photoDisplayQueryOptions = (photoId: string) =>
  queryOptions({
    queryKey: ['photos', photoId, 'display'],
    queryFn: ({ signal }) => apiBlob(`/photos/${encodeURIComponent(photoId)}/display`, signal),
    staleTime: Number.POSITIVE_INFINITY,
    gcTime: 5 * 60_000,
    refetchOnWindowFocus: false,
    retry: false,
  });

export function usePhotoDisplay(photoId: string, enabled = true) {
  return useQuery({ ...photoDisplayQueryOptions(photoId), enabled });
}
