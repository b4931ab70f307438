import type { Request, Response } from 'express';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';

/** A stored file that never changes under its name (a photo size, an issued PDF), ready to answer a request with. */
export interface StoredFileAnswer {
  etag: string;
  contentType: string;
  cacheControl: string;
  bytes?: number;
  /** The name it downloads under; without it the browser shows the file. */
  filename?: string;
  open: () => Promise<Readable>;
}

function matches(ifNoneMatch: string | undefined, etag: string): boolean {
  if (!ifNoneMatch) return false;
  return ifNoneMatch.split(',').some((tag) => {
    const t = tag.trim();
    return t === '*' || t === etag || t === `W/${etag}`;
  });
}

/** Answers with the file, or 304 when the browser already holds this version; opening happens only when needed. */
export async function sendStoredFile(req: Request, res: Response, file: StoredFileAnswer): Promise<void> {
  res.setHeader('ETag', file.etag);
  res.setHeader('Cache-Control', file.cacheControl);
  if (matches(req.headers['if-none-match'], file.etag)) {
    res.status(304).end();
    return;
  }
  const body = await file.open();
  res.status(200);
  res.setHeader('Content-Type', file.contentType);
  if (file.bytes !== undefined) res.setHeader('Content-Length', String(file.bytes));
  if (file.filename) res.setHeader('Content-Disposition', `attachment; filename="${file.filename}"`);
  try {
    await pipeline(body, res);
  } catch {
    // The client went away, or storage failed part way: nothing more can be said on this response.
    res.destroy();
  }
}
