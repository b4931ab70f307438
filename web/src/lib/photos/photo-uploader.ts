import type { DetailedError, FileReader as TusFileReader, HttpStack, Upload as TusUpload, UploadOptions } from 'tus-js-client';
import { ApiError, errorFrom, OfflineError } from '@/lib/api-client';
import type { PhotoBlobRow, WiretrailDb } from '@/lib/db';
import { freeOriginals } from './free-originals';
import { DexieUrlStorage } from './tus-url-storage';
import { clearPhotoProgress, notePhotoProgress, setUploadProgress } from './upload-progress';

export const UPLOAD_CHUNK_BYTES = 1024 * 1024;
/** The server answers about at most this many hashes at once. */
const MISSING_BATCH = 500;
/** After this long sending photos, a round lets notes and readings through and carries on in the next. */
const ROUND_BUDGET_MS = 90_000;
/** Statuses that a later try may get past; every other 4xx is the server refusing the file. */
const TRY_AGAIN = new Set([408, 409, 423, 429]);

export const photoFingerprint = (sha256: string) => `wiretrail-${sha256}`;

type TusModule = { Upload: typeof TusUpload };

export interface PhotoUploaderOptions {
  db: WiretrailDb;
  /** Only this user's photos are sent. */
  userId: string;
  /** Which of these hashes the server lacks (`POST /api/blobs/missing`). */
  missing: (hashes: string[]) => Promise<string[]>;
  /** The tus endpoint, as an absolute URL. */
  endpoint: string;
  accessToken: () => string | undefined;
  /** Renews the access token after a 401; false when the session is gone. */
  refresh: () => Promise<boolean>;
  /** tus-js-client, loaded only once there is something to send. */
  loadTus?: () => Promise<TusModule>;
  /** Tests talk to an in-memory server instead of the network. */
  httpStack?: HttpStack;
  chunkSize?: number;
  retryDelays?: number[] | null;
  budgetMs?: number;
  now?: () => number;
}

export interface UploadRound {
  /** Photos the server now has (sent this round, or already there). */
  confirmed: number;
  sent: number;
  refused: number;
  failed: number;
  /** Photos still to send once the round's time ran out. */
  more: boolean;
}

type Outcome =
  | { kind: 'sent' }
  | { kind: 'refused'; reason: string }
  | { kind: 'failed'; message: string }
  | { kind: 'offline' }
  | { kind: 'unauthorised' }
  | { kind: 'gone' }
  | { kind: 'stopped' };

/** Hands tus slices of the photo's bytes; the same in the browser and in tests. */
const blobReader: TusFileReader = {
  async openFile(input: Blob) {
    return {
      size: input.size,
      slice: async (start: number, end: number) => ({ value: input.slice(start, end), done: end >= input.size }),
      close: () => undefined,
    };
  },
};

function classify(err: Error | DetailedError): Outcome {
  const detailed = err as DetailedError;
  const res = detailed.originalResponse;
  if (!res) {
    // A request that got no answer: no signal, or the server is down.
    if (detailed.originalRequest) return { kind: 'offline' };
    return { kind: 'failed', message: err.message };
  }
  const status = res.getStatus();
  if (status === 401) return { kind: 'unauthorised' };
  if (status === 404 || status === 410) return { kind: 'gone' };
  if (status >= 400 && status < 500 && !TRY_AGAIN.has(status)) return { kind: 'refused', reason: errorFrom(status, res.getBody() ?? '').message };
  return { kind: 'failed', message: `The office system answered ${status} while taking a photo; it is tried again later.` };
}

/**
 * Sends photo bytes before the rows that point at them: asks the server which hashes it lacks, marks the rest as
 * confirmed, and sends each missing one over tus in 1 MB chunks. The upload URL and offset live in IndexedDB
 * (fingerprint `wiretrail-<sha256>`), so after a reload tus asks the server for its offset and carries on there.
 * A photo counts as confirmed only once the server says it has it; only then may its original be freed.
 */
export class PhotoUploader {
  private readonly o: Required<Omit<PhotoUploaderOptions, 'httpStack'>> & Pick<PhotoUploaderOptions, 'httpStack'>;
  private readonly urlStorage: DexieUrlStorage;
  private stopped = false;
  private current: { upload: TusUpload; settle: (o: Outcome) => void } | null = null;

  constructor(options: PhotoUploaderOptions) {
    this.o = {
      loadTus: () => import('tus-js-client'),
      chunkSize: UPLOAD_CHUNK_BYTES,
      retryDelays: [0, 1000, 3000],
      budgetMs: ROUND_BUDGET_MS,
      now: Date.now,
      ...options,
    };
    this.urlStorage = new DexieUrlStorage(options.db);
  }

  /** Ends the upload in flight; what the server has stays there, and the next start carries on from it. */
  stop(): void {
    this.stopped = true;
    const current = this.current;
    this.current = null;
    if (current) {
      void current.upload.abort();
      current.settle({ kind: 'stopped' });
    }
  }

  async run(): Promise<UploadRound> {
    const { db } = this.o;
    const round: UploadRound = { confirmed: 0, sent: 0, refused: 0, failed: 0, more: false };
    const started = this.o.now();
    // Oldest first, read from the index alone: the bytes are read one photo at a time.
    const waiting = (await db.photoBlobs.where('[state+createdAt]').between(['waiting', ''], ['waiting', '\uffff']).primaryKeys()) as string[];
    if (waiting.length > 0) {
      let lacking: Set<string>;
      try {
        lacking = new Set(await this.askMissing(waiting));
        setUploadProgress({ lastError: null });
      } catch (err) {
        if (err instanceof OfflineError || (err instanceof ApiError && err.status === 401)) throw err;
        // The rows still go through; the photos wait for the next round.
        setUploadProgress({ lastError: `Photos could not be checked with the office system: ${(err as Error).message}` });
        return round;
      }
      round.confirmed += await this.confirm(waiting.filter((h) => !lacking.has(h)));
      await this.sendAll(
        waiting.filter((h) => lacking.has(h)),
        round,
        started,
      );
    }
    await freeOriginals(db, this.o.now());
    return round;
  }

  private async askMissing(hashes: string[]): Promise<string[]> {
    const missing: string[] = [];
    for (let i = 0; i < hashes.length; i += MISSING_BATCH) missing.push(...(await this.o.missing(hashes.slice(i, i + MISSING_BATCH))));
    return missing;
  }

  private async confirm(hashes: string[]): Promise<number> {
    const { db } = this.o;
    const at = new Date(this.o.now()).toISOString();
    let confirmed = 0;
    for (const sha256 of hashes) {
      await db.transaction('rw', db.photoBlobs, async () => {
        const row = await db.photoBlobs.get(sha256);
        if (row?.state !== 'waiting') return;
        await db.photoBlobs.put({ ...row, state: 'confirmed', confirmedAt: at, lastError: null });
        confirmed++;
      });
      await this.urlStorage.forget(photoFingerprint(sha256));
      clearPhotoProgress(sha256);
    }
    return confirmed;
  }

  private async sendAll(hashes: string[], round: UploadRound, started: number): Promise<void> {
    const { db } = this.o;
    if (hashes.length === 0) return;
    const sizes = new Map((await db.photo.where('sha256').anyOf(hashes).toArray()).map((p) => [p.sha256 as string, Number(p.sizeBytes) || 0]));
    const total = hashes.reduce((sum, h) => sum + (sizes.get(h) ?? 0), 0);
    let done = 0;
    setUploadProgress({ active: true, roundTotal: total, roundSent: 0 });
    const sent: string[] = [];
    try {
      for (const sha256 of hashes) {
        if (this.stopped) return;
        if (this.o.now() - started > this.o.budgetMs) {
          round.more = true;
          return;
        }
        const row = await db.photoBlobs.get(sha256);
        if (!row || row.state !== 'waiting' || !row.bytes || row.userId !== this.o.userId) continue;
        const outcome = await this.send(row, (bytes) => setUploadProgress({ roundSent: done + bytes }));
        if (outcome.kind === 'sent') {
          sent.push(sha256);
          round.sent++;
          done += row.size;
        } else if (outcome.kind === 'refused') {
          await db.photoBlobs.update(sha256, { state: 'refused', refusedReason: outcome.reason, lastError: null });
          await this.urlStorage.forget(photoFingerprint(sha256));
          clearPhotoProgress(sha256);
          round.refused++;
        } else if (outcome.kind === 'failed') {
          await db.photoBlobs.update(sha256, { lastError: outcome.message });
          round.failed++;
        } else if (outcome.kind === 'offline') {
          throw new OfflineError();
        } else if (outcome.kind === 'unauthorised') {
          throw new ApiError(401, ['Your sign-in has ended.']);
        } else {
          return;
        }
      }
    } finally {
      setUploadProgress({ active: false });
      // Confirmed only when the server itself says it has the bytes; if it cannot be asked now, the next round does.
      if (sent.length > 0) {
        try {
          const still = new Set(await this.askMissing(sent));
          round.confirmed += await this.confirm(sent.filter((h) => !still.has(h)));
        } catch {
          // Left waiting; nothing is freed until confirmed.
        }
      }
    }
  }

  /** One photo, with one token refresh and one fresh start if the server has forgotten the upload. */
  private async send(row: PhotoBlobRow, onBytes: (sent: number) => void): Promise<Outcome> {
    const { Upload } = await this.o.loadTus();
    const fingerprint = photoFingerprint(row.sha256);
    const photoId = (await this.o.db.photo.where('sha256').equals(row.sha256).first())?.id;
    let refreshed = false;
    let restarted = false;
    for (;;) {
      const outcome = await this.attempt(Upload, row, fingerprint, photoId, onBytes);
      if (outcome.kind === 'unauthorised' && !refreshed) {
        refreshed = true;
        if (await this.o.refresh()) continue;
      }
      if (outcome.kind === 'gone') {
        await this.urlStorage.forget(fingerprint);
        if (!restarted) {
          restarted = true;
          continue;
        }
        return { kind: 'failed', message: 'The office system could not find where this photo was being sent; it is sent again later.' };
      }
      return outcome;
    }
  }

  private attempt(Upload: typeof TusUpload, row: PhotoBlobRow, fingerprint: string, photoId: string | undefined, onBytes: (sent: number) => void): Promise<Outcome> {
    return new Promise<Outcome>((resolve) => {
      let settled = false;
      const settle = (outcome: Outcome) => {
        if (settled) return;
        settled = true;
        if (this.current?.upload === upload) this.current = null;
        resolve(outcome);
      };
      const metadata: Record<string, string> = { sha256: row.sha256, filetype: row.mime, filename: `${row.sha256}.jpg` };
      if (photoId) metadata.photoId = photoId;
      const options: UploadOptions = {
        endpoint: this.o.endpoint,
        chunkSize: this.o.chunkSize,
        retryDelays: this.o.retryDelays,
        metadata,
        fingerprint: async () => fingerprint,
        urlStorage: this.urlStorage,
        fileReader: blobReader,
        storeFingerprintForResuming: true,
        removeFingerprintOnSuccess: true,
        onBeforeRequest: (req) => {
          // Read at each request, so a token renewed meanwhile is used.
          const token = this.o.accessToken();
          if (token) req.setHeader('Authorization', `Bearer ${token}`);
        },
        onProgress: (sent, total) => {
          notePhotoProgress(row.sha256, sent, total);
          onBytes(sent);
        },
        onChunkComplete: (_chunk, accepted) => void this.urlStorage.noteOffset(fingerprint, accepted).catch(() => undefined),
        onSuccess: () => settle({ kind: 'sent' }),
        onError: (err) => settle(classify(err)),
      };
      if (this.o.httpStack) options.httpStack = this.o.httpStack;
      const upload = new Upload(new Blob([row.bytes!], { type: row.mime }), options);
      this.current = { upload, settle };
      upload.findPreviousUploads().then(
        (previous) => {
          if (settled) return;
          if (previous[0]) upload.resumeFromPreviousUpload(previous[0]);
          upload.start();
        },
        (err: Error) => settle({ kind: 'failed', message: err.message }),
      );
    });
  }
}
