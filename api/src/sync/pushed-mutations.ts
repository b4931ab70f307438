import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';

/**
 * A push's mutations go around the global ValidationPipe. The engine checks each one on its own, so that one bad
 * mutation is refused alone; the pipe would first walk the whole batch three times (closing array gaps, deleting
 * prototype keys from every object, and class-transformer's deep copy), turning every mutation into a slow
 * dictionary object, which cost a push more than applying it. The pipe still checks the envelope against
 * PushDto: the device id, that `mutations` is a list (what is set aside is replaced by an empty one), and that
 * nothing else came. A key such as `__proto__` in a mutation is then refused by the engine as a field it does not
 * accept, rather than quietly dropped.
 */
const setAside = new WeakMap<Request, unknown[]>();

/** Middleware for `POST sync/push`, after the body parser: keeps a list of mutations aside for the handler. */
export function setMutationsAside(req: Request, _res: Response, next: NextFunction): void {
  const body: unknown = req.body;
  if (body !== null && typeof body === 'object' && 'mutations' in body && Array.isArray(body.mutations)) {
    setAside.set(req, body.mutations);
    body.mutations = [];
  }
  next();
}

/**
 * The mutations of the push, as parsed from its body. Resolved before the body is validated: with no list set
 * aside (no JSON body, say) it gives whatever is there, and PushDto's check refuses the request.
 */
export const PushedMutations = createParamDecorator((_: unknown, ctx: ExecutionContext): unknown => {
  const req = ctx.switchToHttp().getRequest<Request>();
  const body: unknown = req.body;
  return setAside.get(req) ?? (body !== null && typeof body === 'object' && 'mutations' in body ? body.mutations : undefined);
});
