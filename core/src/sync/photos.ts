/** Tags a technician picks from when recording a photo; an organisation may add its own. */
export const PHOTO_TAGS = ['before close-up', 'route', 'connection', 'label', 'finished', 'defect'] as const;

/** Where a photo's bytes stand: on the phone only, on the server with its sizes made, or refused by the server. */
export const PHOTO_UPLOAD_STATES = ['waiting', 'ready', 'refused'] as const;
export type PhotoUploadState = (typeof PHOTO_UPLOAD_STATES)[number];

/** The sizes the server makes from each original. */
export const PHOTO_VARIANTS = { thumb: 320, display: 1600 } as const;
export type PhotoVariant = keyof typeof PHOTO_VARIANTS | 'original';

/** The long edge a phone scales a photo down to before storing and sending it. */
export const PHONE_PHOTO_LONG_EDGE = 2560;
/** Largest original the server accepts, and the pixel count beyond which an image is refused as a decompression bomb. */
export const MAX_PHOTO_BYTES = 25 * 1024 * 1024;
export const MAX_PHOTO_PIXELS = 50_000_000;

export const isSha256 = (v: unknown): v is string => typeof v === 'string' && /^[0-9a-f]{64}$/.test(v);
