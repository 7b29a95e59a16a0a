import type { Request, Response } from 'express';
import multer from 'multer';
import {
  MAX_SHARE_PHOTOS,
  SHARE_DETAILS_FIELD,
  SHARE_PHOTOS_FIELD,
} from '@vatside/contracts/submissions';
import { HttpError } from '../http/errors.ts';

// The first step of the pipeline for a shared skein: one to four photos and one JSON field of
// details in a single multipart request, held in memory, with hard limits on every part.

const DETAILS_MAX_BYTES = 16 * 1024;

export function sharePhotosParser(maxBytes: number) {
  return multer({
    storage: multer.memoryStorage(),
    limits: {
      fileSize: maxBytes,
      files: MAX_SHARE_PHOTOS,
      fields: 2,
      fieldSize: DETAILS_MAX_BYTES,
      parts: MAX_SHARE_PHOTOS + 2,
      headerPairs: 50,
    },
  }).array(SHARE_PHOTOS_FIELD, MAX_SHARE_PHOTOS);
}

function toHttpError(error: unknown, maxBytes: number): HttpError {
  if (!(error instanceof multer.MulterError)) {
    return new HttpError(
      400,
      'VALIDATION_FAILED',
      'The upload was cut off or malformed. Try again.',
    );
  }
  if (error.code === 'LIMIT_FILE_SIZE') {
    const mb = (maxBytes / 1024 / 1024).toFixed(0);
    return new HttpError(
      413,
      'PAYLOAD_TOO_LARGE',
      `A photo is larger than ${mb} MB. Resize it and try again.`,
    );
  }
  if (['LIMIT_FILE_COUNT', 'LIMIT_PART_COUNT', 'LIMIT_UNEXPECTED_FILE'].includes(error.code)) {
    return new HttpError(
      400,
      'VALIDATION_FAILED',
      `Share one to ${MAX_SHARE_PHOTOS} photos of a skein.`,
      {
        [SHARE_PHOTOS_FIELD]: [
          `Send at most ${MAX_SHARE_PHOTOS} photos, in the "${SHARE_PHOTOS_FIELD}" field.`,
        ],
      },
    );
  }
  return new HttpError(400, 'VALIDATION_FAILED', `The upload was refused: ${error.message}.`, {
    [error.field ?? SHARE_DETAILS_FIELD]: ['Send the photos and one "details" field.'],
  });
}

export interface ReceivedShare {
  photos: Express.Multer.File[];
  /** The details field, parsed as JSON (validated by the caller). */
  details: unknown;
}

/** Runs multer on the request; resolves with the photos and the details, or refuses. */
export async function receiveSharePhotos(
  parser: ReturnType<typeof sharePhotosParser>,
  maxBytes: number,
  req: Request,
  res: Response,
): Promise<ReceivedShare> {
  await new Promise<void>((resolve, reject) => {
    parser(req, res, (error?: unknown) =>
      error ? reject(toHttpError(error, maxBytes)) : resolve(),
    );
  });
  const photos = Array.isArray(req.files) ? req.files : [];
  if (photos.length === 0) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'No photo came with the share.', {
      [SHARE_PHOTOS_FIELD]: ['Add one to four JPEG, PNG or WebP photos.'],
    });
  }
  const raw = (req.body as Record<string, unknown> | undefined)?.[SHARE_DETAILS_FIELD];
  if (typeof raw !== 'string') {
    throw new HttpError(400, 'VALIDATION_FAILED', 'The share has no details.', {
      [SHARE_DETAILS_FIELD]: ['Send the base, dyes and notes as a JSON "details" field.'],
    });
  }
  try {
    return { photos, details: JSON.parse(raw) as unknown };
  } catch {
    throw new HttpError(400, 'BAD_JSON', 'The details field is not valid JSON.');
  }
}
