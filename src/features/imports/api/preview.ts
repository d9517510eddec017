import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { importPreviewSchema, type ImportChoice } from '../../../../shared/schemas/import';
import { uploadForm } from './upload-form';

export interface PreviewInput {
  file: File;
  mapping?: Record<string, string>;
  choice?: ImportChoice;
}

/** POST /api/imports?dryRun=1: the detected mapping and the first rows' results; nothing is written. */
const previewImport = ({ file, mapping, choice }: PreviewInput) =>
  api(
    '/api/imports?dryRun=1&previewRows=20',
    { method: 'POST', form: uploadForm(file, mapping, choice) },
    importPreviewSchema,
  );

export const usePreviewImport = () => useMutation({ mutationFn: previewImport });
