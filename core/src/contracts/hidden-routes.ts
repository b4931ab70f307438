import type { RecordReply } from './records.js';

/** A marked photo on the site's map of hidden routes: the photo and the routes drawn over it. */
export interface MarkedPhoto {
  photo: RecordReply<'photo'>;
  markup: RecordReply<'photoMarkup'>;
}

/**
 * The site's map of hidden routes as the office reads it (`GET /api/sites/:id/hidden-routes`): every marked photo on
 * the site that is not voided, and the names its routes are tied to. Core's `hiddenRoutesByWall` groups it.
 */
export interface SiteHiddenRoutes {
  siteId: string;
  entries: MarkedPhoto[];
  areas: Array<{ id: string; name: string }>;
  cables: Array<{ id: string; label: string }>;
  circuits: Array<{ id: string; number: string; description: string | null; rcdRatingMa: number | null }>;
}
