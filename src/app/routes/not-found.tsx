import { Link } from 'react-router-dom';

export function Component() {
  return (
    <div className="mx-auto mt-10 max-w-lg rounded border border-line bg-panel p-8">
      <p className="text-sm font-semibold text-copper-700">404</p>
      <h1 className="text-2xl font-semibold">No such page</h1>
      <p className="mt-2 text-sm text-ink-soft">The address may be mistyped, or the page moved.</p>
      <Link to="/jobs" className="mt-4 inline-block text-sm font-semibold text-copper-700 underline">
        Back to Jobs
      </Link>
    </div>
  );
}
