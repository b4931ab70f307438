import { NotFoundException } from '@nestjs/common';
import type { Request, Response } from 'express';
import { createHash } from 'node:crypto';
import { sendStoredFile } from '../common/stored-file-response.js';
import type { MailAttachment } from '../mail/mail.service.js';
import { type FileStorage, StoredFileMissing } from '../storage/file-storage.js';
import { documentKey } from '../storage/file-stores.js';

/** The SHA-256 kept with an issued PDF, so that any copy can be checked against the one issued. */
export const fingerprint = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

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

/** An issued PDF to attach to an e-mail: exactly what was issued, or nothing (what goes to the customer is checked by its fingerprint). */
export async function issuedPdfAttachment(storage: FileStorage, document: IssuedFile): Promise<MailAttachment> {
  const bytes = await storage.get(documentKey(document.organisationId, document.id));
  if (fingerprint(bytes) !== document.pdfSha256) {
    throw new Error(`The stored PDF of ${String(document.number)} does not match the fingerprint recorded when it was issued, so it was not sent.`);
  }
  return { filename: pdfFilename(document), content: bytes, contentType: 'application/pdf' };
}
