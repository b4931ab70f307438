import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';

/**
 * Keeps Nest's error body for HTTP errors, answers a request body that is not JSON with 400 instead of a bare page,
 * and logs anything unexpected before answering 500.
 */
@Catch()
export class BodyErrorFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    if (exception instanceof HttpException) {
      const body = exception.getResponse();
      res.status(exception.getStatus()).json(typeof body === 'string' ? { statusCode: exception.getStatus(), message: body } : body);
      return;
    }
    const err = exception as { type?: string; status?: number; message?: string };
    if (err?.type === 'entity.parse.failed' || err?.type === 'entity.too.large' || err?.status === 400 || err?.status === 413) {
      const status = err.status === 413 ? HttpStatus.PAYLOAD_TOO_LARGE : HttpStatus.BAD_REQUEST;
      const message = status === 413 ? 'The request body is too large.' : 'The request body is not valid JSON.';
      res.status(status).json({ statusCode: status, message, error: status === 413 ? 'Payload Too Large' : 'Bad Request' });
      return;
    }
    this.logger.error(exception instanceof Error ? exception.stack : String(exception));
    res.status(500).json({ statusCode: 500, message: 'Something went wrong on our side. Please try again.', error: 'Internal Server Error' });
  }
}
