import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { Wordmark } from '../components/wordmark';
import { useSignIn } from '../features/auth/api/session';

export function SignInPage() {
  const signIn = useSignIn();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const next = params.get('next');
  const resetDone = params.get('reset') === 'done';
  const safeNext = next && next.startsWith('/') && !next.startsWith('//') ? next : '/';

  function submit(e: FormEvent) {
    e.preventDefault();
    signIn.mutate({ email, password }, { onSuccess: () => navigate(safeNext, { replace: true }) });
  }

  return (
    <div className="min-h-screen grid place-items-center bg-plate px-4">
      <form
        onSubmit={submit}
        className="w-full max-w-sm rounded-plate border border-line bg-surface p-6 shadow-sm"
        noValidate
      >
        <Wordmark className="text-2xl" />
        <h1 className="mt-4 text-lg font-semibold">Sign in to your group's Rfolio</h1>
        {resetDone && (
          <p role="status" className="mt-3 rounded-plate border-l-4 border-clean bg-plate px-3 py-2 text-sm text-clean">
            Password changed, and every device signed out. Sign in with the new password.
          </p>
        )}
        <label className="mt-4 block text-sm font-medium" htmlFor="email">
          E-mail
        </label>
        <input
          id="email"
          type="email"
          autoComplete="username"
          required
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          className="mt-1 w-full rounded-plate border border-line px-3 py-2"
        />
        <label className="mt-3 block text-sm font-medium" htmlFor="password">
          Password
        </label>
        <input
          id="password"
          type="password"
          autoComplete="current-password"
          required
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          className="mt-1 w-full rounded-plate border border-line px-3 py-2"
        />
        {signIn.error && (
          <p role="alert" className="mt-3 text-sm text-failed">
            {signIn.error.message}
          </p>
        )}
        <button
          type="submit"
          disabled={signIn.isPending}
          className="mt-5 w-full rounded-plate bg-front px-4 py-2 font-medium text-white hover:bg-front-dark disabled:opacity-60"
        >
          {signIn.isPending ? 'Signing in…' : 'Sign in'}
        </button>
        <Link to="/password-reset" className="mt-3 block text-center text-sm text-front hover:underline">
          Forgot your password?
        </Link>
        <p className="mt-4 border-t border-line pt-3 text-xs text-ink-soft">
          New to the group? Accounts are by invitation: open the link in the e-mail an admin sent you.
        </p>
      </form>
    </div>
  );
}
