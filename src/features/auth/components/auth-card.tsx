import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Wordmark } from '../../../components/wordmark';

/** The narrow card of the signed-out pages: sign-in, invitation, password reset. */
export function AuthCard({ title, children, footer }: { title: string; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="min-h-screen grid place-items-center bg-plate px-4 py-8">
      <div className="w-full max-w-sm">
        <section className="rounded-plate border border-line bg-surface p-6 shadow-sm">
          <Link to="/" aria-label="Rfolio home">
            <Wordmark className="text-2xl" />
          </Link>
          <h1 className="mt-4 text-lg font-semibold">{title}</h1>
          <div className="mt-4">{children}</div>
        </section>
        {footer && <div className="mt-3 text-center text-sm">{footer}</div>}
      </div>
    </div>
  );
}

export function FormAlert({ children, tone = 'failed' }: { children: ReactNode; tone?: 'failed' | 'clean' }) {
  const colour = tone === 'failed' ? 'border-failed text-failed' : 'border-clean text-clean';
  return (
    <p
      role={tone === 'failed' ? 'alert' : 'status'}
      className={`mt-3 rounded-plate border-l-4 bg-plate px-3 py-2 text-sm ${colour}`}
    >
      {children}
    </p>
  );
}
