import { Link } from 'react-router-dom';

export function Component() {
  return (
    <div className="py-16 text-center">
      <h1 className="text-2xl font-semibold">Nothing here</h1>
      <p className="mt-2 text-sm text-muted">This address does not lead to a Starproof screen.</p>
      <Link to="/" className="mt-4 inline-block text-sm text-accent hover:underline">
        Go to the overview
      </Link>
    </div>
  );
}
