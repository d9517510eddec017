import type { ImportChoice } from '../../../../shared/schemas/import';

/**
 * The multipart body of POST /api/imports: the file, the header mapping when the user changed it, and the sheet,
 * header row and date order chosen.
 */
export function uploadForm(file: File, mapping?: Record<string, string>, choice: ImportChoice = {}): FormData {
  const form = new FormData();
  form.append('file', file, file.name);
  if (mapping && Object.keys(mapping).length > 0) form.append('mapping', JSON.stringify(mapping));
  for (const [key, value] of Object.entries(choice))
    if (value !== undefined && value !== '') form.append(key, String(value));
  return form;
}
