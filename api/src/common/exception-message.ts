import type { HttpException } from '@nestjs/common';

/** The `message` of a Nest exception's body (a sentence, or the list a validation gives), if it has one. */
export function messageOf(err: HttpException): unknown {
  const body = err.getResponse();
  return typeof body === 'object' && body !== null && 'message' in body ? body.message : undefined;
}
