import { createHash } from 'node:crypto';
import type { Stream } from 'node:stream';
import { PDFParse } from 'pdf-parse';
import type { Response } from 'supertest';
import type { Session } from './sync-helpers.js';
import type { TestApp } from './test-app.js';

export const bearer = (s: Session) => ({ authorization: `Bearer ${s.accessToken}` });
export const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

/** A response body as raw bytes, whatever its type (supertest parses only text and JSON by itself). */
export function asBytes(res: Stream, done: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}

/** The text of every page, with runs of white space made one space so phrases can be looked for whole. */
export async function pdfText(pdf: Buffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    return (await parser.getText()).text.replace(/\s+/g, ' ');
  } finally {
    await parser.destroy();
  }
}

export async function downloadPdf(t: TestApp, s: Session, documentId: string): Promise<{ bytes: Buffer; res: Response }> {
  const res = await t.http.get(`/api/documents/${documentId}/pdf`).set(bearer(s)).buffer(true).parse(asBytes).expect(200);
  return { bytes: res.body as Buffer, res };
}

/** The id of the demo job with this reference. */
export async function jobByReference(t: TestApp, s: Session, reference: string): Promise<{ id: string; siteId: string; customerId: string }> {
  const res = await t.http.get(`/api/jobs?search=${encodeURIComponent(reference)}`).set(bearer(s)).expect(200);
  const job = (res.body.items as Array<{ id: string; reference: string; siteId: string; customerId: string }>).find((j) => j.reference === reference);
  if (!job) throw new Error(`no demo job ${reference}`);
  return job;
}
