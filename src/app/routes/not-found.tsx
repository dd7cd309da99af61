import { Link } from 'react-router';

export function Component() {
  return (
    <div className="mx-auto max-w-xl py-16 text-center">
      <p className="font-mono text-sm text-stone-600">404</p>
      <h1 className="mt-2 text-3xl font-bold text-pine-900">Nothing is staked out here</h1>
      <p className="mt-3 text-stone-700">The page you asked for does not exist, or you do not have access to it.</p>
      <Link to="/" className="mt-6 inline-block font-semibold text-pine-700 underline">
        Back to the start page
      </Link>
    </div>
  );
}
