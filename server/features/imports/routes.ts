import { Router, type RequestHandler } from 'express';
import multer, { MulterError } from 'multer';
import { idParamSchema } from '../../../shared/schemas/common';
import {
  importChoiceSchema,
  importMappingSchema,
  importUploadQuerySchema,
  type ImportChoice,
} from '../../../shared/schemas/import';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { readableMultipart } from '../../http/middleware/multipart';
import { BadRequestError, PayloadTooLargeError, ValidationError } from '../../http/errors';
import { createImport, getImport, listImports, presentLive, resumeImport, settle, sha256Of } from './service';
import { previewUpload } from './preview';
import { importRowsCsv } from './rejected-csv';
import { undoImport, undoPlan } from './undo-import';

/** Largest file an import accepts (bytes). */
const MAX_IMPORT_BYTES = 20 * 1024 * 1024;

export const importsRouter = Router();

const multipart = readableMultipart(
  multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_IMPORT_BYTES, files: 1, fields: 8 } }).single(
    'file',
  ),
);

/** The upload, with a size refusal that says the limit. */
const upload: RequestHandler = (req, res, next) =>
  multipart(req, res, (error) => {
    if (error instanceof MulterError && error.code === 'LIMIT_FILE_SIZE')
      return next(
        new PayloadTooLargeError(
          `The file is larger than ${MAX_IMPORT_BYTES / 1024 / 1024} MB, the most an import accepts; split it.`,
        ),
      );
    next(error);
  });

function mappingField(raw: unknown): Record<string, string> {
  if (raw === undefined || raw === '') return {};
  let parsed: unknown;
  try {
    parsed = JSON.parse(String(raw));
  } catch {
    throw new BadRequestError('The "mapping" field must be JSON: {"header": "field", …}.');
  }
  const result = importMappingSchema.safeParse(parsed);
  if (!result.success) {
    const issue = result.error.issues[0];
    throw new ValidationError(
      `mapping${issue.path.length ? `."${issue.path.join('.')}"` : ''}: ${issue.message}`,
      result.error.issues,
    );
  }
  return result.data;
}

/** The sheet, header row and date order the user chose (multipart fields), checked like any input. */
function choiceFields(body: Record<string, unknown> | undefined): ImportChoice {
  const raw = Object.fromEntries(
    ['sheet', 'headerRow', 'dateOrder'].flatMap((key) =>
      body?.[key] !== undefined && body[key] !== '' ? [[key, body[key]]] : [],
    ),
  );
  const result = importChoiceSchema.safeParse(raw);
  if (!result.success) {
    const issue = result.error.issues[0];
    throw new ValidationError(`${issue.path.join('.')}: ${issue.message}`, result.error.issues);
  }
  return result.data;
}

/** Upload: `?dryRun=1` previews the first rows and writes nothing; otherwise the import starts in the background. */
importsRouter.post(
  '/',
  allow('curator'),
  upload,
  handle({ query: importUploadQuerySchema }, async ({ query }, req, res) => {
    if (!req.file) throw new BadRequestError('Attach the file as multipart field "file".');
    const file = { bytes: req.file.buffer, name: req.file.originalname || 'upload.csv' };
    const overrides = mappingField(req.body?.mapping);
    const choice = choiceFields(req.body);
    if (query.dryRun) {
      res.json(await previewUpload({ ...file, sha256: sha256Of(file.bytes) }, overrides, query.previewRows, choice));
      return;
    }
    const created = await createImport(file, overrides, currentUser(req), choice);
    const current = await settle(created.id, query.wait);
    res
      .status(current.status === 'running' ? 202 : 201)
      .location(`/api/imports/${current.id}`)
      .json(presentLive(current));
  }),
);

importsRouter.get(
  '/',
  allow('curator'),
  handle({}, async (_input, _req, res) => {
    res.json({ items: (await listImports()).map((row) => presentLive(row)) });
  }),
);

importsRouter.get(
  '/:id',
  allow('curator'),
  handle({ params: idParamSchema }, async ({ params }, _req, res) => {
    res.json(presentLive(await getImport(params.id)));
  }),
);

importsRouter.get(
  '/:id/undo-plan',
  allow('curator'),
  handle({ params: idParamSchema }, async ({ params }, _req, res) => {
    res.json(await undoPlan(params.id));
  }),
);

importsRouter.get(
  '/:id/warnings.csv',
  allow('curator'),
  handle({ params: idParamSchema }, async ({ params }, _req, res) => {
    const { fileName, body } = await importRowsCsv(params.id, 'warning');
    res.type('text/csv; charset=utf-8').attachment(fileName).send(body);
  }),
);

importsRouter.get(
  '/:id/rejected.csv',
  allow('curator'),
  handle({ params: idParamSchema }, async ({ params }, _req, res) => {
    const { fileName, body } = await importRowsCsv(params.id, 'rejected');
    res.type('text/csv; charset=utf-8').attachment(fileName).send(body);
  }),
);

importsRouter.post(
  '/:id/resume',
  allow('curator'),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    await resumeImport(params.id, currentUser(req));
    const current = await settle(params.id, 0);
    res.status(202).json(presentLive(current));
  }),
);

/** Undo: retires every record the import added (kept for audit, reason "import N undone"). */
importsRouter.delete(
  '/:id',
  allow('curator'),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    await undoImport(params.id, currentUser(req));
    res.json(presentLive(await getImport(params.id)));
  }),
);
