/** The multipart body of POST /api/imports: the file and, when the user changed it, the header mapping. */
export function uploadForm(file: File, mapping?: Record<string, string>): FormData {
  const form = new FormData();
  form.append('file', file, file.name);
  if (mapping && Object.keys(mapping).length > 0) form.append('mapping', JSON.stringify(mapping));
  return form;
}
