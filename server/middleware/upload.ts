import type { RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '../lib/app-error';

/**
 * One file in field `file`, kept in memory until its content is checked; nothing the user
 * names ever becomes a path. Multer's own errors become field-level 400/413 answers.
 */
export function singleUpload(maxBytes: number): RequestHandler {
  // Browsers send a file name as raw UTF-8 without saying so; read as latin1 (multer's default) "données" arrives as "donnÃ©es".
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 20 }, defParamCharset: 'utf8' }).single('file');
  const limitMb = Math.round(maxBytes / 1024 / 1024);
  return (req, res, next) => {
    upload(req, res, (error: unknown) => {
      if (!error) return next();
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') return next(new AppError('payload_too_large', `The file is larger than ${limitMb} MB`, { file: `At most ${limitMb} MB` }));
        return next(new AppError('validation_failed', 'Send one file in the field "file"', { file: error.message }));
      }
      // Files are kept in memory, so any other failure is a form that could not be parsed.
      next(new AppError('bad_request', 'The upload is not a readable multipart form'));
    });
  };
}
