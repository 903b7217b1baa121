import { UniqueConstraintError } from 'sequelize';
import { MediaLimits } from '@shared/media/limits.ts';
import { MediaUploadFieldsSchema } from '@shared/media/schemas.ts';
import { getSequelize } from '../../db.ts';
import { BadRequestError, ConflictError, zodToValidationError } from '../../errors.ts';
import { requestRenditions } from './media-renditions-job.ts';
import { inspectUpload } from '../../media/inspect.ts';
import { originalKey, originalMime } from '../../media/keys.ts';
import { mediaSettings } from '../../media/settings.ts';
import { Media, type User } from '../../models/index.ts';
import { getStorage } from '../../storage/storage.ts';
import { recordAudit } from '../audit.ts';
import { noteFiles, settleFiles } from './media-file-journal.ts';

/** An upload as multer left it in the temporary folder. */
export interface UploadProps {
  /** The temporary file; the caller removes it afterwards, whatever happens here. */
  file: { path: string; size: number; originalname: string };
  /** The multipart text fields (alt text, credit, licence, source URL), unchecked. */
  fields: unknown;
  uploader: User;
  ip?: string;
}

// Control characters (C0, DEL, C1) and both path separators.
const UNSAFE_NAME = /[\u0000-\u001f\u007f-\u009f/\\]/;

/**
 * Refuses file names a browser would never send: path separators or control characters.
 * @throws HttpError 400 unsafe_file_name
 */
export function checkFileName(name: string): string {
  const message = 'The file name contains path separators or control characters. Rename the file and upload it again.';
  if (!name || UNSAFE_NAME.test(name) || name === '.' || name === '..')
    throw BadRequestError(message, 'unsafe_file_name', { file: message });
  if (name.length > MediaLimits.fileNameMax) {
    const tooLong = `The file name is longer than ${MediaLimits.fileNameMax} characters. Rename the file and upload it again.`;
    throw BadRequestError(tooLong, 'unsafe_file_name', { file: tooLong });
  }
  // Bidirectional overrides and isolates make `photo\u202Egpj.exe` read as `photoexe.jpg`: dropped.
  return name.replace(BIDI_CONTROLS, '').normalize('NFC');
}

/** Unicode's explicit directional embeddings, overrides and isolates (U+202A–U+202E, U+2066–U+2069). */
export const BIDI_CONTROLS = /[\u202a-\u202e\u2066-\u2069]/g;

const duplicate = (existing: Media | null) =>
  ConflictError(
    existing
      ? `This image is already in the library, uploaded as “${existing.fileName}”.`
      : 'This image is already in the library.',
    'duplicate_image',
  );

/**
 * Checks an upload, keeps its original privately under its SHA-256, creates the library entry and
 * queues its renditions. Stores nothing unless every check passes; a failure after the file is
 * stored removes it again.
 * @returns the new image (renditions pending)
 * @throws HttpError 400 for a name, a field or an image that is refused; 409 duplicate_image
 */
export async function uploadMedia({ file, fields, uploader, ip }: UploadProps): Promise<Media> {
  const fileName = checkFileName(file.originalname);
  const parsed = MediaUploadFieldsSchema.safeParse(fields ?? {});
  if (!parsed.success) throw zodToValidationError(parsed.error);
  const image = await inspectUpload(file.path, file.size, mediaSettings().maxPixels);
  const existing = await Media.findOne({ where: { sha256: image.sha256 } });
  if (existing) throw duplicate(existing);

  const key = originalKey(image.sha256, image.format);
  await noteFiles([key]);
  let media: Media;
  try {
    await getStorage().putFile(key, file.path, { contentType: originalMime(image.format) });
    media = await getSequelize().transaction(async (transaction) => {
      const created = await Media.create(
        {
          sha256: image.sha256,
          originalKey: key,
          fileName,
          format: image.format,
          bytes: file.size,
          width: image.width,
          height: image.height,
          altText: parsed.data.altText ?? '',
          credit: parsed.data.credit ?? '',
          licenceId: parsed.data.licenceId || null,
          sourceUrl: parsed.data.sourceUrl ?? '',
          uploadedById: uploader.id,
        },
        { transaction },
      );
      await recordAudit(
        {
          actorId: uploader.id,
          action: 'media.uploaded',
          subjectType: 'media',
          subjectId: created.id,
          data: { fileName, bytes: file.size, width: image.width, height: image.height },
          ip,
        },
        transaction,
      );
      return created;
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw duplicate(await Media.findOne({ where: { sha256: image.sha256 } }));
    throw err;
  } finally {
    // Kept when the row was created (or an identical upload won a race); removed otherwise.
    await settleFiles([key]);
  }
  await requestRenditions(media.id);
  return media.reload();
}
