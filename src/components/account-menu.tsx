import { Link, useNavigate } from 'react-router-dom';
import { useMe, useSignOut } from '../features/auth/api/session';

export function AccountMenu() {
  const { data, isLoading } = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();
  if (isLoading) return null;
  const user = data?.user;
  if (!user) {
    return (
      <Link to="/sign-in" className="inline-block min-h-6 py-0.5 text-sm font-medium text-front hover:underline">
        Sign in
      </Link>
    );
  }
  return (
    <details className="relative text-sm">
      <summary className="cursor-pointer list-none rounded-plate px-2 py-1 hover:bg-plate" aria-label="Account">
        <span className="font-medium">{user.name}</span>{' '}
        <span className="text-ink-soft text-xs uppercase tracking-wide">{user.role}</span>
      </summary>
      <div className="absolute right-0 z-20 mt-1 w-48 rounded-plate border border-line bg-surface shadow-sm">
        <Link to="/account" className="block px-3 py-2 hover:bg-plate">
          Profile and password
        </Link>
        <button
          type="button"
          className="block w-full px-3 py-2 text-left hover:bg-plate"
          onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate('/sign-in') })}
        >
          Sign out
        </button>
      </div>
    </details>
  );
}
