import { formatDateTime } from '../../../lib/dates';

/** A date and time for the people pages: local, to the minute. */
export function whenShort(iso: string | null): string {
  if (!iso) return 'never';
  return formatDateTime(iso);
}

export const roleOptions = [
  { value: 'viewer', label: 'viewer — read, bookmark' },
  { value: 'member', label: 'member — contribute' },
  { value: 'curator', label: 'curator — edit any, merge, import' },
  { value: 'admin', label: 'admin — people and roles' },
];
