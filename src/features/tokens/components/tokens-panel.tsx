import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { ApiRequestError } from '../../../lib/api-client';
import type { CreatedToken } from '../../../../shared/schemas/tokens';
import { useAllTokens, useCreateToken, useMyTokens } from '../api/tokens';
import { TokenList } from './token-list';

type Detail = { path?: string; message?: string };

function fieldErrors(err: unknown): { name?: string; expiresAt?: string; form?: string } {
  if (!(err instanceof ApiRequestError))
    return { form: 'The request did not reach the server. Check your connection and try again.' };
  const details = Array.isArray(err.details) ? (err.details as Detail[]) : [];
  const of = (field: string) => details.find((d) => d.path === `body.${field}`)?.message;
  const name = of('name');
  const expiresAt = of('expiresAt');
  return name || expiresAt ? { name, expiresAt } : { form: err.message };
}

/** The secret of a new token, shown this once, with a copy button. */
function NewSecret({ created, onDone }: { created: CreatedToken; onDone: () => void }) {
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(created.token);
      setCopied('yes');
    } catch {
      setCopied('no');
    }
  };
  return (
    <div role="status" className="space-y-2 rounded-plate border border-clean bg-plate p-3">
      <p className="text-sm font-medium text-ink">
        Token “{created.name}” created. Copy it now: it is shown only this once.
      </p>
      <input
        readOnly
        aria-label="New API token"
        value={created.token}
        onFocus={(e) => e.currentTarget.select()}
        className="figure w-full rounded-plate border border-line bg-surface px-3 py-2 text-sm"
      />
      <div className="flex flex-wrap items-center gap-2">
        <Button variant="primary" size="sm" onClick={copy}>
          Copy token
        </Button>
        <Button size="sm" onClick={onDone}>
          I have stored it
        </Button>
        {copied === 'yes' && <span className="text-sm text-clean">Copied.</span>}
        {copied === 'no' && (
          <span className="text-sm text-failed">The browser refused; select the text and copy it by hand.</span>
        )}
      </div>
    </div>
  );
}

/** Profile: personal API tokens for scripts (create, list, revoke); admins also see everyone's. */
export function TokensPanel({ isAdmin }: { isAdmin: boolean }) {
  const mine = useMyTokens();
  const everyone = useAllTokens(isAdmin);
  const create = useCreateToken();
  const [name, setName] = useState('');
  const [expiresAt, setExpiresAt] = useState('');
  const [readOnly, setReadOnly] = useState(true);
  const [created, setCreated] = useState<CreatedToken | null>(null);
  const errors = create.error ? fieldErrors(create.error) : {};

  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate(
      { name, readOnly, ...(expiresAt ? { expiresAt } : {}) },
      {
        onSuccess: (token) => {
          setCreated(token);
          setName('');
          setExpiresAt('');
        },
      },
    );
  };

  return (
    <div className="space-y-4">
      <p className="text-sm text-ink-soft">
        Scripts and other tools send a token as <code className="figure">Authorization: Bearer …</code>. A token acts
        with your role (or only reads, if read-only) and stops at once when revoked, when it expires, or when your
        account is disabled. See the{' '}
        <Link to="/api-reference" className="text-front underline">
          API reference
        </Link>
        .
      </p>
      {created && <NewSecret created={created} onDone={() => setCreated(null)} />}
      <form onSubmit={submit} noValidate className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Name"
          required
          value={name}
          onChange={(e) => setName(e.target.value)}
          hint="What uses it, e.g. nightly export."
          error={errors.name}
          maxLength={80}
        />
        <TextField
          label="Expires on"
          type="date"
          value={expiresAt}
          onChange={(e) => setExpiresAt(e.target.value)}
          hint="Optional; the token ends at the close of that day (UTC)."
          error={errors.expiresAt}
        />
        <label className="flex min-h-10 items-center gap-2 text-sm text-ink sm:col-span-2">
          <input type="checkbox" checked={readOnly} onChange={(e) => setReadOnly(e.target.checked)} />
          Read-only: GET requests only (exports, searches, record pages; Scout and the tools need a full token)
        </label>
        <div className="sm:col-span-2">
          <Button type="submit" variant="primary" disabled={create.isPending}>
            {create.isPending ? 'Creating…' : 'Create token'}
          </Button>
        </div>
        {errors.form && (
          <p role="alert" className="text-sm text-failed sm:col-span-2">
            {errors.form}
          </p>
        )}
      </form>
      <div>
        <h3 className="text-sm font-semibold text-ink">Your tokens</h3>
        {mine.data ? (
          <TokenList tokens={mine.data.items} />
        ) : (
          <p className="text-sm text-ink-soft">{mine.error ? 'Could not load your tokens.' : 'Loading…'}</p>
        )}
      </div>
      {isAdmin && (
        <div>
          <h3 className="text-sm font-semibold text-ink">Everyone’s tokens (admin)</h3>
          {everyone.data ? (
            <TokenList tokens={everyone.data.items} showOwner />
          ) : (
            <p className="text-sm text-ink-soft">Loading…</p>
          )}
        </div>
      )}
    </div>
  );
}
