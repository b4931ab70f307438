import type { NextFunction, Request, Response } from 'express';

/**
 * How deep a request body may nest. The deepest thing the app sends is a push: envelope, list, mutation, set, and a
 * JSON field's own value (a wiremap, a signature's strokes) a few levels more. Far deeper bodies only come from
 * someone trying to exhaust the stack of the code that walks them (class-transformer recurses once per level).
 */
export const MAX_BODY_DEPTH = 64;

/** Whether a parsed body nests deeper than `max`; walked with a stack of its own, so that it cannot overflow itself. */
export function nestsDeeperThan(value: unknown, max: number): boolean {
  const stack: Array<[unknown, number]> = [[value, 0]];
  while (stack.length > 0) {
    const [v, depth] = stack.pop()!;
    if (v === null || typeof v !== 'object') continue;
    if (depth >= max) return true;
    for (const child of Array.isArray(v) ? v : Object.values(v)) if (child !== null && typeof child === 'object') stack.push([child, depth + 1]);
  }
  return false;
}

/** Refuses, after the body parser and before any handler, a body nested deeper than MAX_BODY_DEPTH. */
export function refuseDeepBodies(req: Request, res: Response, next: NextFunction): void {
  if (req.body !== null && typeof req.body === 'object' && nestsDeeperThan(req.body, MAX_BODY_DEPTH)) {
    res.status(400).json({ statusCode: 400, message: `The request body nests deeper than ${MAX_BODY_DEPTH} levels.`, error: 'Bad Request' });
    return;
  }
  next();
}
