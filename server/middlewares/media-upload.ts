import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import type { RequestHandler } from 'express';
import multer, { MulterError } from 'multer';
import { HttpError } from '../errors.ts';
import { instanceTmpDir } from '../media/instance.ts';
import { mediaSettings } from '../media/settings.ts';

const megabytes = (bytes: number) => `${Math.round(bytes / (1024 * 1024))} MB`;

const tooLarge = (limit: number) => {
  const message = `The file is larger than the ${megabytes(limit)} limit. Reduce or compress it, then upload it again.`;
  return new HttpError(413, 'file_too_large', message, { file: message });
};

function translate(err: unknown, limit: number): HttpError {
  if (err instanceof MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return tooLarge(limit);
    if (err.code === 'LIMIT_FILE_COUNT' || err.code === 'LIMIT_UNEXPECTED_FILE') {
      return new HttpError(400, 'one_file', 'Send one image per upload, in the form field named "file".');
    }
    return new HttpError(400, 'malformed_upload', 'The upload form had too many or too large fields.');
  }
  // busboy refuses part headers it cannot parse, e.g. a raw control character in the file name.
  return new HttpError(
    400,
    'malformed_upload',
    'The upload form could not be read: it was cut off, or a part of it (such as a file name with control characters) is malformed. Rename the file and try again.',
  );
}

/**
 * Streams one multipart file (field `file`) to a temporary file under this process's folder in uploads/tmp with a random
 * name (the client's name is kept only as text, never used as a path) and stops at the size limit.
 * multer removes its partial file when it gives up; the route removes the finished one.
 */
export const singleImageUpload: RequestHandler = (req, res, next) => {
  const { uploadMaxBytes } = mediaSettings();
  const tmpDir = instanceTmpDir();
  // Refuse at once what the browser says is too large, rather than reading it first.
  const declared = Number(req.get('content-length'));
  if (Number.isFinite(declared) && declared > uploadMaxBytes + 1024 * 1024) {
    res.set('Connection', 'close');
    return next(tooLarge(uploadMaxBytes));
  }
  fs.mkdirSync(tmpDir, { recursive: true });
  const upload = multer({
    storage: multer.diskStorage({ destination: tmpDir, filename: (_req, _file, cb) => cb(null, `upload-${randomUUID()}`) }),
    limits: { fileSize: uploadMaxBytes, files: 1, fields: 8, fieldSize: 8 * 1024, parts: 10 },
    // Keep the name exactly as sent, so a name with path separators is refused rather than trimmed.
    preservePath: true,
    defParamCharset: 'utf8',
  }).single('file');
  upload(req, res, (err?: unknown) => next(err ? translate(err, uploadMaxBytes) : undefined));
};
