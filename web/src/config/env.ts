/** The API is served from the same origin (the Vite dev server proxies /api), so the base is a path. */
export const env = {
  apiBase: (import.meta.env.VITE_API_BASE as string | undefined) ?? '/api',
  version: __APP_VERSION__,
} as const;
