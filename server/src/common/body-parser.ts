import type { INestApplication } from '@nestjs/common';
import express, { type NextFunction, type Request, type Response } from 'express';
import { toApiError } from './all-exceptions.filter';

/** Largest JSON body the API takes; uploads go through multipart, not JSON. */
export const JSON_BODY_LIMIT = '10mb';

/**
 * JSON bodies are parsed here rather than by Nest so that a malformed or
 * oversized body gets the API's own JSON error, not Express's HTML page.
 */
export function installJsonBodyParser(app: INestApplication): void {
  app.use(express.json({ limit: JSON_BODY_LIMIT, strict: true }));
  app.use(express.urlencoded({ extended: false, limit: '100kb' }));
  app.use((err: { status?: number; type?: string; message?: string }, _req: Request, res: Response, next: NextFunction) => {
    if (!err) return next();
    const status = err.status && err.status >= 400 && err.status < 500 ? err.status : 400;
    const message =
      err.type === 'entity.too.large'
        ? `the request body is larger than ${JSON_BODY_LIMIT}`
        : err.type === 'entity.parse.failed'
          ? `the request body is not valid JSON: ${err.message}`
          : (err.message ?? 'the request body could not be read');
    res.status(status).json(toApiError(status, message));
  });
}
