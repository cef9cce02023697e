import { Link } from 'react-router-dom';

/** One page for "does not exist" and "not yours": the answer never confirms a pattern exists. */
export function NotFoundPage() {
  return (
    <div className="card max-w-lg" role="alert">
      <h1>Not found</h1>
      <p className="mt-2">There is nothing here, or it has not been shared with you.</p>
      <Link className="link mt-4 inline-block" to="/">
        Go to the start page
      </Link>
    </div>
  );
}
