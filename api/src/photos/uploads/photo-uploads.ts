import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { InjectRepository } from '@nestjs/typeorm';
import { FileStore } from '@tus/file-store';
import { ERRORS, EVENTS, Server, type Upload } from '@tus/server';
import { isSha256, MAX_PHOTO_BYTES } from '@wiretrail/core';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { IncomingMessage } from 'node:http';
import { mkdirSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Repository } from 'typeorm';
import type { AccessTokenPayload } from '../../auth/jwt.strategy.js';
import { sessionUser } from '../../auth/session-user.js';
import type { AuthUser } from '../../common/decorators/current-user.decorator.js';
import { photosConfig } from '../../config/photos.config.js';
import { User } from '../../users/entities/user.entity.js';
import { PhotoRefused, REFUSALS } from '../image-processing.js';
import { PhotosService } from '../photos.service.js';

export const UPLOADS_PATH = '/api/uploads';
/** An upload left unfinished this long is deleted; a phone that comes back later starts that photo again. */
const UNFINISHED_UPLOAD_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;
const TUS_RESUMABLE = '1.0.0';

/** An answer for the phone: tus sends the body as the error's text. */
interface TusAnswer {
  status_code: number;
  body: string;
}

const SIGN_IN = 'Sign in to continue.';
const SESSION_ENDED = 'Your session has ended. Please sign in again.';
const NO_SUCH_UPLOAD = 'This upload is not on the server (it finished, was refused or expired). Start the photo again.';
const SOMETHING_WRONG = 'Something went wrong on our side. Please try again.';

/** tus's own refusals that a phone may show, in our words; the rest pass as tus wrote them. */
const PLAIN_WORDS = new Map<unknown, string>([
  [ERRORS.ERR_MAX_SIZE_EXCEEDED, REFUSALS.tooLarge],
  [ERRORS.ERR_SIZE_EXCEEDED, 'More bytes were sent than the upload said the photo holds.'],
  [ERRORS.INVALID_OFFSET, 'The upload was resumed from the wrong place. Ask the server how much it has (HEAD) and carry on from there.'],
  [ERRORS.FILE_NO_LONGER_EXISTS, NO_SUCH_UPLOAD],
]);

const callerFrom = (user: User): AuthUser => ({ id: user.id, organisationId: user.organisationId, role: user.role, email: user.email, name: user.name });

/**
 * Resumable photo uploads (the tus 1.0 protocol) under /api/uploads: create, ask the offset (HEAD), send the rest
 * (PATCH). Every request carries the access token; an upload belongs to the user who created it. Unfinished uploads
 * wait on local disk; a finished one is checked and handed to PhotosService, then deleted here.
 * Mounted in app.setup.ts ahead of the body parsers, which must never read an upload's bytes.
 */
@Injectable()
export class PhotoUploads implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('PhotoUploads');
  private readonly store: FileStore;
  private readonly tus: Server;
  /** The signed-in caller of each request in flight, for tus's hooks, which only see tus's own view of the request. */
  private readonly callers = new WeakMap<IncomingMessage, AuthUser>();
  private sweeper?: NodeJS.Timeout;

  constructor(
    @Inject(photosConfig.KEY) private readonly config: ConfigType<typeof photosConfig>,
    private readonly photos: PhotosService,
    private readonly jwt: JwtService,
    @InjectRepository(User) private readonly users: Repository<User>,
  ) {
    mkdirSync(config.uploadDirectory, { recursive: true });
    this.store = new FileStore({ directory: config.uploadDirectory, expirationPeriodInMilliseconds: UNFINISHED_UPLOAD_LIFETIME_MS });
    this.tus = new Server({
      path: UPLOADS_PATH,
      datastore: this.store,
      maxSize: MAX_PHOTO_BYTES,
      // Relative, so the address is right behind any proxy (and Vite's dev server) without trusting forwarded headers.
      relativeLocation: true,
      // The app is served from the same origin; no other site may upload.
      allowedOrigins: () => false,
      onUploadCreate: (req, upload) => this.onCreate(req, upload),
      onUploadFinish: (req, upload) => this.onFinish(req, upload),
      onResponseError: (_req, err) => this.inPlainWords(err),
    });
    // After the response to the last PATCH has been written: the bytes are kept elsewhere by now.
    this.tus.on(EVENTS.POST_FINISH, (_req: unknown, _res: unknown, upload: Upload) => void this.discard(upload.id));
  }

  async onApplicationBootstrap(): Promise<void> {
    // Before the app listens, so that a phone asking about its photo after a restart gets the final word.
    await this.keepReceived().catch((err) => this.logger.warn(`Could not keep uploads received before a restart: ${err}`));
    const sweep = () => this.store.deleteExpired().catch((err) => this.logger.warn(`Could not clear old uploads: ${err}`));
    void sweep();
    this.sweeper = setInterval(sweep, 6 * 60 * 60 * 1000).unref();
  }

  /**
   * Keeps (or refuses) uploads whose bytes all arrived but that a previous process was stopped in the middle of
   * checking. Left alone, the phone's tus client finds the upload complete and asks nothing more, while the server
   * never held the photo.
   */
  private async keepReceived(): Promise<void> {
    for (const id of (await this.store.configstore.list?.()) ?? []) {
      const upload = await this.store.getUpload(id).catch(() => null);
      if (!upload || upload.size === undefined || upload.offset !== upload.size) continue;
      const { userId, organisationId, sha256 } = upload.metadata ?? {};
      const user = userId && organisationId ? await this.users.findOneBy({ id: userId, organisationId }) : null;
      try {
        if (user?.active && isSha256(sha256)) await this.photos.acceptUpload(callerFrom(user), sha256, await readFile(join(this.config.uploadDirectory, id)));
      } catch (err) {
        // Refused, it goes as it would have; anything else leaves it for the next start (the phone sends it again meanwhile).
        if (!(err instanceof PhotoRefused)) throw err;
      }
      await this.discard(id);
    }
  }

  onModuleDestroy(): void {
    clearInterval(this.sweeper);
  }

  handler(): RequestHandler {
    return (req: Request, res: Response, next: NextFunction) => {
      if (req.path !== UPLOADS_PATH && !req.path.startsWith(`${UPLOADS_PATH}/`)) return next();
      this.handle(req, res).catch(next);
    };
  }

  private async handle(req: Request, res: Response): Promise<void> {
    // The upload area is never read back: photos are served by /api/photos, with their own checks.
    if (req.method === 'GET') return this.answer(res, 404, NO_SUCH_UPLOAD);
    if (req.method !== 'OPTIONS') {
      const user = await this.authenticate(req.headers.authorization);
      if (typeof user === 'string') return this.answer(res, 401, user);
      if (req.method !== 'POST' && (await this.ownerOf(req.path.slice(UPLOADS_PATH.length + 1))) !== user.id) {
        return this.answer(res, 404, NO_SUCH_UPLOAD);
      }
      this.callers.set(req, user);
    }
    await this.tus.handle(req, res);
  }

  /** The same checks as the JWT guard: a valid access token of an active user in a session still going. Returns the refusal otherwise. */
  private async authenticate(header: string | undefined): Promise<AuthUser | string> {
    const token = /^Bearer\s+(\S+)$/i.exec(header ?? '')?.[1];
    if (!token) return SIGN_IN;
    let payload: AccessTokenPayload;
    try {
      payload = await this.jwt.verifyAsync<AccessTokenPayload>(token, { algorithms: ['HS256'] });
    } catch {
      return SESSION_ENDED;
    }
    const user = await sessionUser(this.users, payload);
    if (!user) return SESSION_ENDED;
    return callerFrom(user);
  }

  private async ownerOf(id: string): Promise<string | null> {
    if (!/^[0-9a-f]{32}$/.test(id)) return null;
    try {
      return (await this.store.getUpload(id)).metadata?.userId ?? null;
    } catch {
      return null;
    }
  }

  private callerOf(req: unknown): AuthUser {
    const node = nodeRequestOf(req);
    const user = node && this.callers.get(node);
    if (!user) throw { status_code: 401, body: SIGN_IN } satisfies TusAnswer;
    return user;
  }

  private async onCreate(req: unknown, upload: Upload): Promise<{ metadata: Record<string, string | null> }> {
    const user = this.callerOf(req);
    const sha256 = upload.metadata?.sha256;
    if (!isSha256(sha256)) {
      throw { status_code: 400, body: 'Upload-Metadata must carry sha256: the photo’s sha256 as 64 lowercase hex digits.' } satisfies TusAnswer;
    }
    // The owner is recorded by the server, whatever the device sent under these names.
    return { metadata: { ...upload.metadata, userId: user.id, organisationId: user.organisationId } };
  }

  private async onFinish(req: unknown, upload: Upload): Promise<Record<string, never>> {
    const user = this.callerOf(req);
    try {
      const bytes = await readFile(join(this.config.uploadDirectory, upload.id));
      await this.photos.acceptUpload(user, upload.metadata!.sha256!, bytes);
      return {};
    } catch (err) {
      // Refused or failed, the upload goes: a retry starts afresh instead of finding it complete and unchecked.
      await this.discard(upload.id);
      if (err instanceof PhotoRefused) throw { status_code: err.status, body: err.message } satisfies TusAnswer;
      throw err;
    }
  }

  private inPlainWords(err: Error | TusAnswer): TusAnswer {
    if (!('status_code' in err)) {
      this.logger.error(err instanceof Error ? err.stack : String(err));
      return { status_code: 500, body: SOMETHING_WRONG };
    }
    if (err.status_code === 500) return { status_code: 500, body: SOMETHING_WRONG };
    return { status_code: err.status_code, body: PLAIN_WORDS.get(err) ?? err.body.trim() };
  }

  private async discard(id: string): Promise<void> {
    await this.store.remove(id).catch(() => undefined);
  }

  private answer(res: Response, status: number, message: string): void {
    res.status(status).set({ 'Tus-Resumable': TUS_RESUMABLE, 'Content-Type': 'text/plain; charset=utf-8', 'Cache-Control': 'no-store' }).send(message);
  }
}

/** The Node request under tus's web Request (`req.runtime.node.req`), which its types do not name. */
function nodeRequestOf(req: unknown): IncomingMessage | undefined {
  const runtime = typeof req === 'object' && req !== null && 'runtime' in req ? req.runtime : undefined;
  const node = typeof runtime === 'object' && runtime !== null && 'node' in runtime ? runtime.node : undefined;
  const incoming = typeof node === 'object' && node !== null && 'req' in node ? node.req : undefined;
  return incoming instanceof IncomingMessage ? incoming : undefined;
}
