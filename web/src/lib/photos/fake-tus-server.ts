import type { HttpRequest, HttpResponse, HttpStack } from 'tus-js-client';
import { sha256Hex } from './photo-bytes';

interface StoredUpload {
  length: number;
  metadata: Record<string, string>;
  chunks: Uint8Array[];
  offset: number;
}

export interface Refusal {
  status: number;
  message: string;
}

/**
 * A tus 1.0 server in memory, for tests: creation, HEAD, PATCH, a hash check on completion, refusals by hash,
 * and a connection that can be cut after so many chunks. Every request is logged.
 */
export class FakeTusServer implements HttpStack {
  readonly uploads = new Map<string, StoredUpload>();
  /** Hashes of complete, accepted files. */
  readonly stored = new Set<string>();
  readonly log: { method: string; path: string; offset?: number; auth?: string }[] = [];
  refuse = new Map<string, Refusal>();
  /** Cut the connection on the PATCH after this many PATCHes have gone through. */
  cutAfterPatches: number | null = null;
  /** Answer the next n requests 401. */
  expireTokens = 0;
  /** Called on every request, before it is answered. */
  onRequest: (method: string) => void = () => undefined;
  private patches = 0;
  private next = 1;

  constructor(readonly origin = 'http://wiretrail.test') {}

  getName(): string {
    return 'FakeTusServer';
  }

  createRequest(method: string, url: string): HttpRequest {
    return new FakeRequest(this, method, url);
  }

  /** `POST /api/blobs/missing`. */
  async missing(hashes: string[]): Promise<string[]> {
    return hashes.filter((h) => !this.stored.has(h));
  }

  async handle(method: string, url: string, headers: Record<string, string>, body: Blob | null): Promise<FakeResponse> {
    const path = new URL(url).pathname;
    const offsetHeader = headers['Upload-Offset'];
    this.log.push({ method, path, offset: offsetHeader !== undefined ? Number(offsetHeader) : undefined, auth: headers.Authorization });
    this.onRequest(method);
    if (this.expireTokens > 0) {
      this.expireTokens--;
      return new FakeResponse(401, {}, '{"statusCode":401,"message":"Unauthorized"}');
    }
    if (method === 'POST' && path === '/api/uploads') {
      const id = `u${this.next++}`;
      const metadata = Object.fromEntries(
        (headers['Upload-Metadata'] ?? '')
          .split(',')
          .filter(Boolean)
          .map((pair) => {
            const [key, value = ''] = pair.split(' ');
            return [key!, Buffer.from(value, 'base64').toString()];
          }),
      );
      const length = Number(headers['Upload-Length']);
      this.uploads.set(id, { length, metadata, chunks: [], offset: 0 });
      return new FakeResponse(201, { Location: `/api/uploads/${id}` });
    }
    const id = path.split('/').pop()!;
    const upload = this.uploads.get(id);
    if (!upload) return new FakeResponse(404, {}, 'Not found');
    if (method === 'HEAD') return new FakeResponse(200, { 'Upload-Offset': String(upload.offset), 'Upload-Length': String(upload.length) });
    if (method === 'PATCH') {
      if (this.cutAfterPatches !== null && this.patches >= this.cutAfterPatches) {
        this.cutAfterPatches = null;
        throw new Error('connection reset');
      }
      this.patches++;
      if (Number(offsetHeader) !== upload.offset) return new FakeResponse(409, {}, 'Offset mismatch');
      const bytes = new Uint8Array(await body!.arrayBuffer());
      upload.chunks.push(bytes);
      upload.offset += bytes.byteLength;
      if (upload.offset === upload.length) {
        const all = new Uint8Array(upload.length);
        let at = 0;
        for (const c of upload.chunks) {
          all.set(c, at);
          at += c.byteLength;
        }
        const sha = upload.metadata.sha256!;
        const refusal = this.refuse.get(sha);
        if (refusal) return new FakeResponse(refusal.status, {}, refusal.message);
        if ((await sha256Hex(all.buffer)) !== sha) return new FakeResponse(400, {}, 'The bytes do not match their sha256.');
        this.stored.add(sha);
      }
      return new FakeResponse(204, { 'Upload-Offset': String(upload.offset) });
    }
    return new FakeResponse(405, {});
  }
}

class FakeRequest implements HttpRequest {
  private readonly headers: Record<string, string> = {};
  private progress: (sent: number) => void = () => undefined;
  private aborted = false;

  constructor(
    private readonly server: FakeTusServer,
    private readonly method: string,
    private readonly url: string,
  ) {}

  getMethod() {
    return this.method;
  }
  getURL() {
    return this.url;
  }
  setHeader(header: string, value: string) {
    this.headers[header] = value;
  }
  getHeader(header: string) {
    return this.headers[header];
  }
  setProgressHandler(handler: (sent: number) => void) {
    this.progress = handler;
  }
  async send(body: Blob | null = null): Promise<HttpResponse> {
    // As on the network: the answer comes later, never in the same tick.
    await new Promise((r) => setTimeout(r, 0));
    if (this.aborted) throw new Error('aborted');
    const res = await this.server.handle(this.method, this.url, this.headers, body);
    if (body) this.progress(body.size);
    return res;
  }
  async abort() {
    this.aborted = true;
  }
  getUnderlyingObject() {
    return null;
  }
}

class FakeResponse implements HttpResponse {
  constructor(
    private readonly status: number,
    private readonly headers: Record<string, string>,
    private readonly body = '',
  ) {}
  getStatus() {
    return this.status;
  }
  getHeader(header: string) {
    return this.headers[header];
  }
  getBody() {
    return this.body;
  }
  getUnderlyingObject() {
    return null;
  }
}
