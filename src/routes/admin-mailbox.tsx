import { Card } from '../components/ui/card';
import { EmptyState } from '../components/ui/empty-state';
import { PageLoading } from '../components/ui/page-loading';
import { useMailbox } from '../features/mailbox/api/mailbox';
import { ApiRequestError } from '../lib/api-client';
import { formatDateTime } from '../lib/dates';

/** What the app's own SMTP server caught (development, demo and tests); production has no such inbox. */
export default function AdminMailboxPage() {
  const { data, isLoading, error } = useMailbox();
  if (isLoading) return <PageLoading />;
  if (error) {
    const absent = error instanceof ApiRequestError && error.status === 404;
    return (
      <EmptyState title={absent ? 'No local inbox here' : 'The inbox could not be read'}>
        {absent
          ? 'This server sends real e-mail through its SMTP relay, so there is no local inbox to show.'
          : error.message}
      </EmptyState>
    );
  }
  return (
    <section className="space-y-4">
      <header>
        <h1 className="text-2xl font-semibold">Local test inbox</h1>
        <p className="mt-1 text-sm text-ink-soft">
          Every e-mail the app sent, caught by its own SMTP server on{' '}
          <span className="figure">127.0.0.1:{data!.smtpPort ?? '—'}</span>. Only in development, demo and test runs;
          kept in memory, newest first, refreshed every 5 s.
        </p>
      </header>
      {data!.items.length === 0 ? (
        <EmptyState title="No mail yet">
          Invite someone or ask for a password reset; the message appears here.
        </EmptyState>
      ) : (
        <ul className="space-y-3" aria-label="Caught messages">
          {data!.items.map((m) => (
            <li key={m.id}>
              <Card
                title={m.subject}
                level={2}
                actions={<span className="figure text-xs text-ink-soft">{formatDateTime(m.receivedAt)}</span>}
              >
                <p className="text-sm">
                  <span className="text-ink-soft">To</span> <span className="font-medium">{m.to.join(', ')}</span>
                  <span className="ml-3 text-ink-soft">From</span> {m.from}
                </p>
                <pre className="mt-2 whitespace-pre-wrap font-sans text-sm text-ink">{m.text}</pre>
                {m.links.length > 0 && (
                  <ul className="mt-2 space-y-1 text-sm">
                    {m.links.map((l) => (
                      <li key={l}>
                        <a href={l} className="break-all text-front underline" data-mail-to={m.to[0]}>
                          {l}
                        </a>
                      </li>
                    ))}
                  </ul>
                )}
              </Card>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
