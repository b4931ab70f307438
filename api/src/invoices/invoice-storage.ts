import { dirname, join } from 'node:path';
import type { DocumentsConfig } from '../config/documents.config.js';
import { DOCUMENT_KEYS } from '../documents/storage/document-storage.js';
import { createFileStorage, type FileStorage, type KeySpace } from '../photos/storage/photo-storage.js';

export const INVOICE_STORAGE = Symbol('InvoiceStorage');

/**
 * Issued quotes', invoices' and credit notes' PDFs: the same kind of store as documents, keyed the same way
 * (documentKey: organisation, then id), in a place of their own: `invoices/` beside `documents/` on disk or in the bucket.
 */
export const INVOICE_KEYS: KeySpace = { pattern: DOCUMENT_KEYS.pattern, prefix: 'invoices/' };

export const createInvoiceStorage = (config: DocumentsConfig): Promise<FileStorage> =>
  createFileStorage({ ...config, directory: join(dirname(config.directory), 'invoices') }, INVOICE_KEYS);
