import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { ImportCommitSchema, ImportMappingSchema, type ImportDto } from '@shared/schemas/catalogue-import.ts';
import { CatalogueLimits } from '@shared/validations.ts';
import { HttpError, ValidationError } from '../../errors.ts';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate } from '../../middlewares/validate.ts';
import type { CatalogueImport } from '../../models/index.ts';
import { authorize } from '../../policies/index.ts';
import { commitCatalogueImport, checkCatalogueImport } from '../../services/catalogue/index.ts';
import { loadImport } from '../load.ts';

/** The form fields beside the file: the column mapping, as JSON text (multer gives every field as text). */
const ImportFieldsSchema = z.object({ mapping: z.string().optional() });

const megabytes = (bytes: number) => `${Math.round(bytes / (1024 * 1024))} MB`;

// Files are read in memory: they are checked and turned into rows, never kept as files.
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: CatalogueLimits.importMaxBytes, files: 1, fields: 5, fieldSize: 64 * 1024 },
});

/** Multer's errors, turned into messages a person can act on. */
const receiveFile: RequestHandler = (req, res, next) => {
  upload.single('file')(req, res, (error: unknown) => {
    if (!error) return next();
    if (error instanceof multer.MulterError && error.code === 'LIMIT_FILE_SIZE') {
      return next(
        new HttpError(
          413,
          'file_too_large',
          `The file is larger than ${megabytes(CatalogueLimits.importMaxBytes)}, the most one import takes. Split it into smaller files (about 100,000 rows each at most) and import them one after another.`,
        ),
      );
    }
    if (error instanceof multer.MulterError)
      return next(
        new HttpError(400, 'bad_upload', `The upload could not be read (${error.message}). Send one file in the field "file".`),
      );
    next(error);
  });
};

const present = (record: CatalogueImport, commit?: { inserted: number; alreadyCommitted: boolean }): ImportDto => ({
  id: record.id,
  status: record.status,
  report: record.report,
  committedAt: record.committedAt?.toISOString() ?? null,
  createdAt: record.createdAt.toISOString(),
  ...(commit === undefined ? {} : { insertedCount: commit.inserted, alreadyCommitted: commit.alreadyCommitted }),
});

export const importsRouter = Router();

// Authorize before reading the upload, so nobody without the right streams 10 MB at us.
importsRouter.post(
  '/',
  (req, _res, next) => {
    authorize(currentUser(req), 'catalogue', 'import');
    next();
  },
  receiveFile,
  async (req, res) => {
    const viewer = currentUser(req);
    if (!req.file) throw ValidationError('Choose a CSV file to check.', { file: 'Choose a CSV file' });
    const { mapping: mappingText } = ImportFieldsSchema.parse(req.body ?? {});
    let mapping: unknown;
    try {
      mapping = mappingText ? JSON.parse(mappingText) : undefined;
    } catch {
      throw ValidationError('The column mapping is not valid JSON.', { mapping: 'Not valid JSON' });
    }
    const parsedMapping = ImportMappingSchema.parse(mapping);
    const record = await checkCatalogueImport(req.file, parsedMapping, viewer);
    res.status(201).json({ data: present(record) });
  },
);

importsRouter.get('/:id', async (req, res) => {
  const record = await loadImport(req.params.id);
  authorize(currentUser(req), 'catalogue', 'import');
  res.json({ data: present(record) });
});

importsRouter.post('/:id/commit', validate(ImportCommitSchema), async (req, res) => {
  const viewer = currentUser(req);
  const { id } = await loadImport(req.params.id);
  authorize(viewer, 'catalogue', 'import');
  const { record, ...commit } = await commitCatalogueImport(id, viewer, { confirm: req.body.confirm === true, ip: req.ip });
  res.json({ data: present(record, commit) });
});
