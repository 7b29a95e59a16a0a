import { Link } from 'react-router-dom';

export function Component() {
  return (
    <section className="max-w-xl space-y-4">
      <h1 className="font-display text-3xl font-semibold">No pot on this burner</h1>
      <p>There is nothing at this address in the console.</p>
      <Link
        to="/"
        className="inline-flex min-h-12 items-center rounded-xl border-2 border-vat-800 px-5 font-bold hover:bg-vat-100"
      >
        Back to the studio desk
      </Link>
    </section>
  );
}
