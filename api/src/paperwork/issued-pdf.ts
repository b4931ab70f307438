import { NotFoundException } from '@nestjs/common';
import type { Request, Response } from 'express';
import { sendStoredFile } from '../../common/stored-file-response.js';
import { type FileStorage, StoredFileMissing } from '../../storage/file-storage.js';
import { documentKey } from '../../storage/file-stores.js';

/** An issued PDF never changes, so a browser may keep it; it is the caller's own, so not in shared caches. */
const CACHE_ISSUED = 'private, max-age=31536000, immutable';

/** What serving an issued PDF needs to know: a certificate's row, or a quote's or invoice's. */
export interface IssuedFile {
  id: string;
  organisationId: string;
  number?: unknown;
  issuedAt?: unknown;
  pdfSha256?: unknown;
  pdfBytes?: unknown;
}

/** The name an issued PDF downloads and is attached under: its number. */
export const pdfFilename = (document: IssuedFile) => `${String(document.number).replace(/[^\w.-]+/g, '-')}.pdf`;

/** Answers with a document's issued PDF as a download named by its number. */
export async function sendIssuedPdf(storage: FileStorage, document: IssuedFile, req: Request, res: Response): Promise<void> {
  if (!document.issuedAt || typeof document.pdfSha256 !== 'string') throw new NotFoundException('This document has no issued PDF.');
  await sendStoredFile(req, res, {
    etag: `"${document.pdfSha256}"`,
    contentType: 'application/pdf',
    cacheControl: CACHE_ISSUED,
    bytes: typeof document.pdfBytes === 'number' ? document.pdfBytes : undefined,
    filename: pdfFilename(document),
    open: async () => {
      try {
        return await storage.stream(documentKey(document.organisationId, document.id));
      } catch (err) {
        if (err instanceof StoredFileMissing) throw new NotFoundException('The PDF of this document is missing from storage.');
        throw err;
      }
    },
  });
}
