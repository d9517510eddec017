/** A date and time for the people pages: local, to the minute. */
export function whenShort(iso: string | null): string {
  if (!iso) return 'never';
  return new Date(iso).toLocaleString(undefined, { year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit' });
}

export const roleOptions = [
  { value: 'viewer', label: 'viewer — read, bookmark' },
  { value: 'member', label: 'member — contribute' },
  { value: 'curator', label: 'curator — edit any, merge, import' },
  { value: 'admin', label: 'admin — people and roles' },
];
