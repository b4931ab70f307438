import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { STATUS_CODES } from 'node:http';

/** What the body parser refuses, by its error's type, in words a person can act on. */
const BODY_REFUSALS: Record<string, [number, string]> = {
  'entity.parse.failed': [400, 'The request body is not valid JSON.'],
  'entity.too.large': [413, 'The request body is too large.'],
  'charset.unsupported': [415, 'The request body must be JSON in UTF-8.'],
  'encoding.unsupported': [415, 'The request body is compressed in a way the server does not read. Send it plain, or as gzip, deflate or br.'],
};
const NOT_DECOMPRESSIBLE: [number, string] = [400, 'The request body is not the compressed data its Content-Encoding says.'];

/** The body parser's refusal behind an error, whether Nest's Express adapter wrapped it in an HttpException or not. */
function bodyRefusal(exception: unknown): [number, string] | null {
  const err = exception instanceof HttpException ? exception.cause : exception;
  if (typeof err !== 'object' || err === null) return null;
  const type = 'type' in err ? err.type : undefined;
  const code = 'code' in err ? err.code : undefined;
  if (typeof type === 'string' && Object.prototype.hasOwnProperty.call(BODY_REFUSALS, type)) return BODY_REFUSALS[type]!;
  if (typeof code === 'string' && code.startsWith('Z_')) return NOT_DECOMPRESSIBLE;
  return null;
}

const errorBody = (statusCode: number, message: string | string[]) => ({ statusCode, message, error: STATUS_CODES[statusCode] ?? 'Error' });

/**
 * Keeps Nest's `{ statusCode, message, error }` body for every HTTP error (also those Nest makes from a plain
 * string), answers what the body parser refuses in our words instead of its own, and logs anything unexpected
 * before answering 500.
 */
@Catch()
export class BodyErrorFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    const refusal = bodyRefusal(exception);
    if (refusal) {
      res.status(refusal[0]).json(errorBody(...refusal));
      return;
    }
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      const body = exception.getResponse();
      res.status(status).json(typeof body === 'string' ? errorBody(status, body) : body);
      return;
    }
    this.logger.error(exception instanceof Error ? exception.stack : String(exception));
    res.status(500).json(errorBody(500, 'Something went wrong on our side. Please try again.'));
  }
}
