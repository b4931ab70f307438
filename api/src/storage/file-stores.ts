import type { StorageConfig } from '../config/storage.config.js';
import { createFileStorage, type FileStorage, type KeySpace } from './file-storage.js';

/** The three stores, each with its keys: photos' bytes, issued documents' PDFs, and quotes', invoices' and credit notes' PDFs. */
export const PHOTO_STORAGE = Symbol('PhotoStorage');
export const DOCUMENT_STORAGE = Symbol('DocumentStorage');
export const INVOICE_STORAGE = Symbol('InvoiceStorage');

export type StoredVariant = 'original' | 'thumb' | 'display';

/** One folder per organisation, one per photo's sha256: the same bytes are stored once per organisation. */
export function photoKey(organisationId: string, sha256: string, variant: StoredVariant): string {
  return `${organisationId}/${sha256}/${variant === 'original' ? 'original' : `${variant}.webp`}`;
}

/** Keys are organisation id / sha256 / file name; anything else is refused before it reaches a driver. */
export const PHOTO_KEY = /^[0-9a-f-]{36}\/[0-9a-f]{64}\/(original|thumb\.webp|display\.webp)$/;

export const PHOTO_KEYS: KeySpace = { pattern: PHOTO_KEY, prefix: '' };

/** One folder per organisation; an issued PDF is written once, under its row's id, and never replaced. */
export function documentKey(organisationId: string, documentId: string): string {
  return `${organisationId}/${documentId}.pdf`;
}

export const DOCUMENT_KEYS: KeySpace = { pattern: /^[0-9a-f-]{36}\/[0-9a-f-]{36}\.pdf$/, prefix: 'documents/' };

/** Keyed like documents (organisation, then id), in a place of their own: `invoices/` on disk and in the bucket. */
export const INVOICE_KEYS: KeySpace = { pattern: DOCUMENT_KEYS.pattern, prefix: 'invoices/' };

export const createPhotoStorage = (config: StorageConfig): Promise<FileStorage> =>
  createFileStorage({ driver: config.driver, directory: config.directories.photos, s3: config.s3 }, PHOTO_KEYS);

export const createDocumentStorage = (config: StorageConfig): Promise<FileStorage> =>
  createFileStorage({ driver: config.driver, directory: config.directories.documents, s3: config.s3 }, DOCUMENT_KEYS);

export const createInvoiceStorage = (config: StorageConfig): Promise<FileStorage> =>
  createFileStorage({ driver: config.driver, directory: config.directories.invoices, s3: config.s3 }, INVOICE_KEYS);
