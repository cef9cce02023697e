import { errorText } from './field.js';

/** What a failed query shows in place of its content, with a way to try again. */
export function QueryError({ error, retry }: { error: unknown; retry?: () => void }) {
  return (
    <div role="alert" className="card error-text">
      <p className="font-semibold">{errorText(error)}</p>
      {retry && (
        <button type="button" className="btn mt-2" onClick={retry}>
          Try again
        </button>
      )}
    </div>
  );
}
