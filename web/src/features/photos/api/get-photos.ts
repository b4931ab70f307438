import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** A photo as the office reads it: the synced row, who took it, and when its visit was planned. */
export interface ServerPhoto {
  id: string;
  visitId: string;
  siteId: string;
  areaId: string | null;
  subjectType: string | null;
  subjectId: string | null;
  caption: string | null;
  tags: unknown;
  takenAt: string | null;
  sha256: string | null;
  sizeBytes: number | null;
  width: number | null;
  height: number | null;
  uploadState: string | null;
  createdAt: string | null;
  createdById: string | null;
  /** Given by servers that know it; otherwise the name comes from the team list. */
  createdByName?: string | null;
  visitPlannedStart: string | null;
  /** Voided on site with its reason: kept for the office, struck through, never printed. */
  voidedAt?: string | null;
  voidReason?: string | null;
}

export interface PhotoPage {
  items: ServerPhoto[];
  total: number;
  page: number;
  pageSize: number;
}

export interface PhotoFilters {
  jobId?: string;
  visitId?: string;
  areaId?: string;
  subjectType?: string;
  subjectId?: string;
  tag?: string;
  technicianId?: string;
  page?: number;
  pageSize?: number;
}

export const photosQueryOptions = (filters: PhotoFilters) => {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(filters)) if (v !== undefined && v !== '') params.set(k, String(v));
  return queryOptions({
    queryKey: ['photos', filters],
    queryFn: ({ signal }) => api.get<PhotoPage>(`/photos?${params}`, signal),
    placeholderData: keepPreviousData,
  });
};

export function usePhotos(filters: PhotoFilters) {
  return useQuery(photosQueryOptions(filters));
}
