import type { Request, Response } from 'express';
import multer from 'multer';
import { HttpError } from '../http/errors.ts';

// The first step of the pipeline: one file, held in memory, with hard limits on every part.

export const UPLOAD_FIELD = 'image';

export function imageUploadParser(maxBytes: number) {
  return multer({
    storage: multer.memoryStorage(),
    limits: {
      fileSize: maxBytes,
      files: 1,
      fields: 8,
      fieldSize: 1024,
      parts: 10,
      headerPairs: 50,
    },
  }).single(UPLOAD_FIELD);
}

function toHttpError(error: unknown, maxBytes: number): HttpError {
  if (error instanceof multer.MulterError) {
    if (error.code === 'LIMIT_FILE_SIZE') {
      const mb = (maxBytes / 1024 / 1024).toFixed(0);
      return new HttpError(
        413,
        'PAYLOAD_TOO_LARGE',
        `This photo is larger than ${mb} MB. Resize it and try again.`,
      );
    }
    const field = error.field ?? UPLOAD_FIELD;
    return new HttpError(400, 'VALIDATION_FAILED', `The upload was refused: ${error.message}.`, {
      [field]: [`Send one photo in the "${UPLOAD_FIELD}" field.`],
    });
  }
  return new HttpError(400, 'VALIDATION_FAILED', 'The upload was cut off or malformed. Try again.');
}

/** Runs multer on the request; resolves with the one file or refuses with the error shape. */
export async function receiveImage(
  parser: ReturnType<typeof imageUploadParser>,
  maxBytes: number,
  req: Request,
  res: Response,
): Promise<Express.Multer.File> {
  await new Promise<void>((resolve, reject) => {
    parser(req, res, (error?: unknown) =>
      error ? reject(toHttpError(error, maxBytes)) : resolve(),
    );
  });
  if (!req.file) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'No photo came with the upload.', {
      [UPLOAD_FIELD]: ['Choose a JPEG, PNG or WebP photo.'],
    });
  }
  return req.file;
}
