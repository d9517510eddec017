import { Link } from 'react-router-dom';

export function NotFoundPage() {
  return (
    <section className="mx-auto max-w-xl py-12 text-center">
      <p className="font-mono text-5xl text-spot">Rf 0</p>
      <h1 className="mt-4 text-xl font-semibold">Nothing moved off the baseline here</h1>
      <p className="mt-2 text-ink-soft">This page does not exist. Check the address, or start from the home page.</p>
      <Link to="/" className="mt-6 inline-block text-front underline">
        Home
      </Link>
    </section>
  );
}
