import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { FinishingInputError } from '../../shared/errors';
import { AppError } from '../lib/app-error';

function zodFields(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError('not_found', `No API route ${req.method} ${req.originalUrl.split('?')[0]}`));
};

interface BodyParserError {
  type?: string;
  status?: number;
}

// Body-parser and the router refuse a request they cannot read with an HTTP 4xx of their own.
const unreadable: Record<string, string> = {
  'charset.unsupported': 'Send the request body as UTF-8',
  'encoding.unsupported': 'The request body is compressed in a way the server does not read',
};

function clientFault(error: BodyParserError): AppError | null {
  if (typeof error?.status !== 'number' || error.status < 400 || error.status >= 500) return null;
  if (error instanceof URIError) return new AppError('bad_request', 'The address has a malformed %-escape');
  return new AppError('bad_request', unreadable[error.type ?? ''] ?? 'The request could not be read');
}

// PostgreSQL's class 22 (data exception): a value from the request it cannot hold. SQLite takes them as they are.
const refusedValue: Record<string, string> = {
  '22003': 'A number is too large to store',
  '22021': 'Text may not contain NUL or other invalid characters',
};

function databaseRefusedValue(error: unknown): AppError | null {
  const code = (error as { driverError?: { code?: unknown } } | null)?.driverError?.code;
  if (typeof code !== 'string' || !code.startsWith('22')) return null;
  return new AppError('bad_request', refusedValue[code] ?? 'A value in the request cannot be stored as given');
}

function toAppError(error: unknown): AppError | null {
  if (error instanceof AppError) return error;
  if (error instanceof ZodError) {
    return new AppError('validation_failed', 'Some fields need attention', zodFields(error));
  }
  if (error instanceof FinishingInputError) {
    return new AppError('validation_failed', error.message, { [error.field]: error.message });
  }
  const refused = databaseRefusedValue(error);
  if (refused) return refused;
  // The database's own guards (see the sessions-and-coats migration) speak for themselves.
  const dbMessage = error instanceof Error ? error.message : '';
  if (dbMessage.includes('booth_overlap')) return new AppError('conflict', 'The booth is already booked at that time', { start: 'Overlaps another spray session of this booth' });
  if (dbMessage.includes('append_only: upkeep')) return new AppError('conflict', 'Upkeep, crew and photo records are never changed or deleted; record a new one instead');
  if (dbMessage.includes('append_only')) return new AppError('conflict', 'Coat records are never changed or deleted; record a correction instead');
  const parserError = error as BodyParserError;
  if (parserError?.type === 'entity.parse.failed') return new AppError('bad_request', 'The request body is not valid JSON');
  if (parserError?.type === 'entity.too.large') return new AppError('payload_too_large', 'The request body is too large');
  return clientFault(parserError);
}

export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const known = toAppError(error);
  if (known) {
    res.status(known.status).json({ error: { code: known.code, message: known.message, ...(known.fields ? { fields: known.fields } : {}) } });
    return;
  }
  req.log?.error({ err: error }, 'unhandled error');
  res.status(500).json({ error: { code: 'internal', message: `Something went wrong on our side (request ${String(req.id)})` } });
};
