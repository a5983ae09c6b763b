import { Link } from 'react-router-dom';

export default function NotFoundRoute() {
  return (
    <main id="main" className="mx-auto max-w-xl px-6 py-16">
      <title>Not found · Polecourt</title>
      <p className="text-sm font-medium text-ink-muted">404</p>
      <h1 className="mt-1 text-2xl font-semibold">There is no page at this address</h1>
      <p className="mt-2 text-ink-muted">The link may be mistyped, or the page may have moved.</p>
      <p className="mt-6">
        <Link to="/" className="font-medium text-accent underline">
          Go to the overview
        </Link>
      </p>
    </main>
  );
}
