import { ArgumentsHost, Catch, HttpException, HttpStatus, Logger, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import { loggableError } from './loggable-error';

/** The shape of every error the API answers with. */
export interface ApiError {
  statusCode: number;
  error: string;
  message: string;
  issues?: { path: string; message: string }[];
}

/** Builds the JSON error for an HTTP status and whatever was thrown. */
export function toApiError(status: number, body: unknown): ApiError {
  const error = (HttpStatus[status] ?? 'Error')
    .toLowerCase()
    .split('_')
    .map((w) => w[0].toUpperCase() + w.slice(1))
    .join(' ');
  if (typeof body === 'string') return { statusCode: status, error, message: body };
  const obj = (body ?? {}) as Record<string, unknown>;
  const message = Array.isArray(obj.message) ? obj.message.join('; ') : String(obj.message ?? error);
  const out: ApiError = { statusCode: status, error, message };
  if (Array.isArray(obj.issues)) out.issues = obj.issues as ApiError['issues'];
  return out;
}

/** Error codes of a full disk or quota: the file system's (ENOSPC, EDQUOT) and SQLite's (SQLITE_FULL). */
const STORAGE_FULL = new Set(['ENOSPC', 'EDQUOT', 'SQLITE_FULL']);

/** Whether an error (or the error it wraps) says the server's storage is full. */
export function isStorageFull(err: unknown): boolean {
  for (let e = err as { code?: unknown; cause?: unknown } | undefined, depth = 0; e && depth < 5; e = e.cause as typeof e, depth++) {
    if (typeof e.code === 'string' && STORAGE_FULL.has(e.code)) return true;
  }
  return false;
}

/**
 * Every error leaves as JSON that says what was wrong; an unexpected one is
 * logged here and answered without its stack, so the server keeps running and
 * tells nothing of its insides.
 */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('HTTP');

  catch(exception: unknown, host: ArgumentsHost): void {
    if (host.getType() !== 'http') throw exception;
    const res = host.switchToHttp().getResponse<Response>();
    if (res.headersSent) return;
    if (exception instanceof HttpException) {
      res.status(exception.getStatus()).json(toApiError(exception.getStatus(), exception.getResponse()));
      return;
    }
    this.logger.error(loggableError(exception));
    if (isStorageFull(exception)) {
      // 507 Insufficient Storage (RFC 4918 §11.5): not the client's fault, and worth retrying once space is freed.
      res.status(507).json(toApiError(507, 'the server has run out of storage space; nothing of this request was stored. Try again later, and tell whoever runs the server'));
      return;
    }
    res.status(500).json(toApiError(500, 'something went wrong on the server; the error was logged and nothing you sent was stored half-way'));
  }
}
