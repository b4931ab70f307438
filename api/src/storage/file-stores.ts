import { createFileStorage, type FileStorage, type KeySpace } from '../../photos/storage/photo-storage.js';
import type { DocumentsConfig } from '../../config/documents.config.js';

export const DOCUMENT_STORAGE = Symbol('DocumentStorage');

/** One folder per organisation; a document's PDF is written once, under its id, and never replaced. */
export function documentKey(organisationId: string, documentId: string): string {
  return `${organisationId}/${documentId}.pdf`;
}

export const DOCUMENT_KEYS: KeySpace = { pattern: /^[0-9a-f-]{36}\/[0-9a-f-]{36}\.pdf$/, prefix: 'documents/' };

export const createDocumentStorage = (config: DocumentsConfig): Promise<FileStorage> => createFileStorage(config, DOCUMENT_KEYS);
