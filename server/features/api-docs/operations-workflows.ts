import { z } from 'zod';
import {
  duplicatesResponseSchema,
  mergeHistorySchema,
  mergePreviewSchema,
  mergeResultSchema,
  unmergeResultSchema,
} from '../../../shared/schemas/curation-dto';
import { importDtoSchema, importListSchema, importPreviewSchema, undoPlanSchema } from '../../../shared/schemas/import';
import {
  photoAnnotationHistorySchema,
  photoAnnotationSchema,
  plateReadingSchema,
} from '../../../shared/schemas/plates';
import { created, fileField, ok, type OperationText } from './operation-helpers';

/** Curation, imports and plate reading: the operations that change many records at once or read photos. */
/* The answer of a dismissal, which has no shared schema of its own. */
const dismissalSchema = z.object({
  id: z.number().int(),
  recordIds: z.array(z.number().int()),
  signature: z.string(),
  reason: z.string().nullish(),
});

export const workflowOperations: Record<string, OperationText> = {
  'GET /api/curation/duplicates': {
    tag: 'Curation',
    summary: 'Possible duplicates',
    answers: [ok(duplicatesResponseSchema)],
  },
  'POST /api/curation/duplicates/dismiss': {
    tag: 'Curation',
    summary: 'Dismiss a group of possible duplicates',
    answers: [created(dismissalSchema)],
  },
  'GET /api/curation/merge-preview': {
    tag: 'Curation',
    summary: 'Preview a merge of records',
    answers: [ok(mergePreviewSchema)],
  },
  'POST /api/curation/merge': { tag: 'Curation', summary: 'Merge records', answers: [created(mergeResultSchema)] },
  'GET /api/curation/merges': { tag: 'Curation', summary: 'Merge history', answers: [ok(mergeHistorySchema)] },
  'POST /api/curation/unmerge/{mergeId}': {
    tag: 'Curation',
    summary: 'Undo a merge',
    answers: [ok(unmergeResultSchema)],
  },

  'POST /api/imports': {
    tag: 'Imports',
    summary: 'Import a CSV, XLSX or SDF file (or preview it with dryRun=1)',
    answers: [
      ok(importPreviewSchema, 'The preview (dryRun).'),
      created(importDtoSchema, 'Imported.'),
      { status: 202, description: 'Still running; poll GET /api/imports/{id}.', json: importDtoSchema },
    ],
    extra: {
      multipart: z.object({
        file: fileField('The workbook or SD file.'),
        mapping: z
          .string()
          .optional()
          .meta({ description: 'JSON {"header": "field", …} overriding the guessed columns.' }),
      }),
    },
  },
  'GET /api/imports': { tag: 'Imports', summary: 'Recent imports', answers: [ok(importListSchema)] },
  'GET /api/imports/{id}': { tag: 'Imports', summary: 'One import and its progress', answers: [ok(importDtoSchema)] },
  'GET /api/imports/{id}/rejected.csv': {
    tag: 'Imports',
    summary: 'The rows an import kept out, as CSV',
    answers: [{ status: 200, description: 'CSV.', media: { type: 'text/csv' } }],
  },
  'GET /api/imports/{id}/warnings.csv': {
    tag: 'Imports',
    summary: 'The rows an import took in with warnings (and why), as CSV',
    answers: [{ status: 200, description: 'CSV.', media: { type: 'text/csv' } }],
  },
  'GET /api/imports/{id}/undo-plan': {
    tag: 'Imports',
    summary: 'What undoing the import would do to its records, merged and edited ones included',
    answers: [ok(undoPlanSchema)],
  },
  'POST /api/plates/read': {
    tag: 'Plates',
    summary: 'Read plates, origin and front, lanes and spots (with Rf) from a plate photo; nothing is stored',
    answers: [ok(plateReadingSchema, 'Plates left to right, lanes left to right, spots by Rf ascending.')],
    extra: { multipart: z.object({ photo: fileField('A JPEG, PNG or WebP photo of one or more plates.') }) },
  },
  'GET /api/plates/photos/{id}/annotation': {
    tag: 'Plates',
    summary: "A record photo's plate marks (the overlay editor's latest revision)",
    answers: [ok(photoAnnotationSchema)],
  },
  'GET /api/plates/photos/{id}/annotation/revisions': {
    tag: 'Plates',
    summary: "Every revision of a record photo's plate marks",
    answers: [ok(photoAnnotationHistorySchema)],
  },
  'PUT /api/plates/photos/{id}/annotation': {
    tag: 'Plates',
    summary: "Save a new revision of a record photo's plate marks",
    answers: [ok(photoAnnotationSchema)],
  },
  'POST /api/imports/{id}/resume': {
    tag: 'Imports',
    summary: 'Resume an interrupted import',
    answers: [{ status: 202, description: 'Resumed.', json: importDtoSchema }],
  },
  'DELETE /api/imports/{id}': {
    tag: 'Imports',
    summary: 'Undo an import (retires its records)',
    answers: [ok(importDtoSchema)],
  },
};
