import type { RequestHandler } from 'express';
import { MulterError } from 'multer';
import { AppError } from '../errors';

/**
 * Runs a multer middleware so that a body its multipart parser (busboy) cannot read — a malformed part header,
 * a missing boundary, a form cut short — is refused with 400 and the parser's reason, not taken for a server
 * fault. Multer's own errors (size, field count, unexpected field) and application errors pass on unchanged.
 */
export function readableMultipart(parse: RequestHandler): RequestHandler {
  return (req, res, next) =>
    parse(req, res, (error?: unknown) => {
      if (!error || error instanceof MulterError || error instanceof AppError) return next(error);
      const reason = error instanceof Error ? error.message : String(error);
      next(
        new AppError(
          400,
          'bad_upload',
          `The upload could not be read as multipart/form-data (${reason}); send the file in a well-formed multipart body.`,
        ),
      );
    });
}
