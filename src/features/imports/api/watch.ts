import type { QueryClient } from '@tanstack/react-query';
import type { ImportDto } from '../../../../shared/schemas/import';
import { showToast } from '../../../components/ui/toast';
import { getImport } from './import-detail';
import { changedByImports, importKeys } from './keys';

const watched = new Set<number>();

/** "3 added, 1 rejected, 2 duplicates of 6 rows" */
export function countsLine(
  item: Pick<ImportDto, 'accepted' | 'rejected' | 'duplicates' | 'processed' | 'total'>,
): string {
  return (
    `${item.accepted} added, ${item.rejected} rejected, ${item.duplicates} ` +
    `duplicate${item.duplicates === 1 ? '' : 's'} of ${item.total} rows`
  );
}

/**
 * Follows an import that is still running after the upload answered, even if the user leaves the page:
 * polls it every 1.5 s, and when it ends shows a toast (background work) and refreshes what it changed.
 */
export function watchImport(qc: QueryClient, item: ImportDto) {
  if (item.status !== 'running' || watched.has(item.id)) {
    if (item.status !== 'running')
      void Promise.all(changedByImports.map((queryKey) => qc.invalidateQueries({ queryKey })));
    return;
  }
  watched.add(item.id);
  const tick = async () => {
    let current: ImportDto;
    try {
      current = await getImport(item.id);
    } catch {
      setTimeout(tick, 3_000);
      return;
    }
    qc.setQueryData(importKeys.detail(item.id), current);
    if (current.status === 'running') {
      setTimeout(tick, 1_500);
      return;
    }
    watched.delete(item.id);
    void Promise.all([importKeys.list(), ...changedByImports].map((queryKey) => qc.invalidateQueries({ queryKey })));
    showToast(
      current.status === 'completed'
        ? { tone: 'done', title: `Import of ${current.fileName} finished`, body: countsLine(current) + '.' }
        : {
            tone: 'problem',
            title: `Import of ${current.fileName} stopped`,
            body:
              `${current.error ?? 'It failed.'} ${current.processed} of ${current.total} rows were ` +
              `committed; resume it from the import page.`,
          },
    );
  };
  setTimeout(tick, 1_500);
}
