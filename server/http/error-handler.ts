import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ApiError } from '@shared/http/api-error';
import { HttpError } from './http-error';
import { logger } from './logger';

/** Answers unmatched API paths with JSON rather than the app shell. */
export const apiNotFound: RequestHandler = (req, res) => {
  const body: ApiError = {
    error: { code: 'not-found', message: `No API route ${req.method} ${req.path}.` },
  };
  res.status(404).json(body);
};

/** The single place errors become responses; anything unexpected is logged and hidden. */
export const errorHandler: ErrorRequestHandler = (error: unknown, req, res, next) => {
  if (res.headersSent) {
    next(error);
    return;
  }
  if (error instanceof HttpError) {
    const body: ApiError = { error: { code: error.code, message: error.message } };
    if (error.issues) body.error.issues = error.issues;
    res.status(error.status).json(body);
    return;
  }
  if (isBodyParserError(error)) {
    res.status(error.status).json({
      error: {
        code: 'malformed-body',
        message: `The request body could not be read: ${error.message}`,
      },
    } satisfies ApiError);
    return;
  }
  logger.error({ err: error, method: req.method, url: req.originalUrl }, 'request failed');
  res.status(500).json({
    error: { code: 'internal', message: 'Something went wrong on the server; it has been logged.' },
  } satisfies ApiError);
};

function isBodyParserError(error: unknown): error is { status: number; message: string } {
  return (
    typeof error === 'object' &&
    error !== null &&
    'type' in error &&
    'status' in error &&
    typeof (error as { status: unknown }).status === 'number'
  );
}
