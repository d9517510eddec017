import type { ApiToken } from '../../../../shared/schemas/tokens';
import { Button } from '../../../components/ui/button';
import { useRevokeToken } from '../api/tokens';

const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const when = (iso: string | null, none: string) => (iso ? dateTime.format(new Date(iso)) : none);

const statusClass: Record<ApiToken['status'], string> = {
  active: 'text-clean',
  expired: 'text-ink-soft',
  revoked: 'text-failed',
};

/** Tokens as rows that fold to stacked lines on a phone; revoking asks once before it acts. */
export function TokenList({ tokens, showOwner = false }: { tokens: ApiToken[]; showOwner?: boolean }) {
  const revoke = useRevokeToken();
  if (tokens.length === 0) return <p className="text-sm text-ink-soft">No tokens yet.</p>;
  return (
    <ul className="divide-y divide-line" aria-label="API tokens">
      {tokens.map((t) => (
        <li key={t.id} className="flex flex-wrap items-start justify-between gap-x-4 gap-y-2 py-3">
          <div className="min-w-0 flex-1">
            <p className="break-words font-medium text-ink">
              {t.name} <span className="figure text-xs text-ink-soft">{t.prefix}…</span>
            </p>
            <p className="text-xs text-ink-soft">
              <span className={statusClass[t.status]}>{t.status}</span>
              {t.readOnly ? ' · read-only' : ' · reads and writes'}
              {showOwner && ` · ${t.owner.name} (${t.owner.email})`}
            </p>
            <p className="text-xs text-ink-soft">
              Created {when(t.createdAt, '')} · last used {when(t.lastUsedAt, 'never')}
              {t.expiresAt && ` · ${t.status === 'expired' ? 'expired' : 'expires'} ${when(t.expiresAt, '')}`}
              {t.revokedAt && ` · revoked ${when(t.revokedAt, '')}`}
            </p>
          </div>
          {t.status === 'active' && (
            <Button
              size="sm"
              variant="danger"
              disabled={revoke.isPending}
              onClick={() => {
                if (window.confirm(`Revoke “${t.name}”? Scripts using it stop working at once.`)) revoke.mutate(t.id);
              }}
            >
              Revoke
            </Button>
          )}
        </li>
      ))}
    </ul>
  );
}
