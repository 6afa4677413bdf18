import type { Request, Response } from 'express';
import multer, { MulterError } from 'multer';

import { AppError, badRequest } from '../errors/app-error';

const TOO_LARGE = (maxBytes: number, advice: string) => `The file is larger than ${Math.round(maxBytes / (1024 * 1024))} MB. ${advice}`;

/**
 * Reads one multipart file into memory. Called from the handler, after authentication, so
 * nobody who is not signed in (or lacks the role) can make the server buffer an upload.
 */
export function readSingleFile(
  req: Request,
  res: Response,
  field: string,
  maxBytes: number,
  tooLargeAdvice = 'Export it smaller (lower resolution, or SVG) and try again.',
): Promise<Express.Multer.File | undefined> {
  const parse = multer({
    storage: multer.memoryStorage(),
    // Browsers send file names as raw UTF-8; busboy's default would read them as Latin-1.
    defParamCharset: 'utf8',
    limits: { fileSize: maxBytes, files: 1, fields: 5, fieldSize: 1024, parts: 6, headerPairs: 50 },
  }).single(field);
  return new Promise((resolve, reject) => {
    parse(req, res, (err: unknown) => {
      if (!err) resolve(req.file);
      else if (err instanceof MulterError && err.code === 'LIMIT_FILE_SIZE') reject(new AppError(413, 'PAYLOAD_TOO_LARGE', TOO_LARGE(maxBytes, tooLargeAdvice)));
      else if (err instanceof MulterError && err.code === 'LIMIT_UNEXPECTED_FILE') reject(badRequest(`Send exactly one file, in the form field named “${field}”.`));
      else reject(badRequest(`The upload could not be read (${err instanceof Error ? err.message : 'malformed form data'}). Try again.`));
    });
  });
}
