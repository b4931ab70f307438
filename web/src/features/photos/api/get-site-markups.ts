import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DatumMark, MarkedAccessory, MarkedRoute, SiteHiddenRoutes } from '@wiretrail/core';
import { useMemo } from 'react';
import { api } from '@/lib/api-client';

/** What the desk's photo viewer draws over one photo: the photo's own size and the markup in its pixels. */
export interface PhotoRoutes {
  width: number;
  height: number;
  routes: readonly MarkedRoute[];
  datums: readonly DatumMark[];
  accessories: readonly MarkedAccessory[];
}

// The same address and cache key as the site's map of hidden routes, so both read one copy.
const siteMarkupsQueryOptions = (siteId: string) =>
  queryOptions({
    queryKey: ['sites', siteId, 'hidden-routes'],
    queryFn: ({ signal }) => api.get<SiteHiddenRoutes>(`/sites/${encodeURIComponent(siteId)}/hidden-routes`, signal),
  });

/** The routes drawn over each of a site's photos, by photo id. */
export function useSiteMarkups(siteId: string | undefined): ReadonlyMap<string, PhotoRoutes> {
  const query = useQuery({ ...siteMarkupsQueryOptions(siteId ?? ''), enabled: !!siteId });
  return useMemo(() => {
    const byPhoto = new Map<string, PhotoRoutes>();
    for (const { photo, markup } of query.data?.entries ?? []) {
      const routes = markup.routes ?? [];
      if (routes.length === 0 || byPhoto.has(photo.id)) continue;
      byPhoto.set(photo.id, {
        width: photo.width && photo.width > 0 ? photo.width : 1600,
        height: photo.height && photo.height > 0 ? photo.height : 1200,
        routes,
        datums: markup.datums ?? [],
        accessories: markup.accessories ?? [],
      });
    }
    return byPhoto;
  }, [query.data]);
}
