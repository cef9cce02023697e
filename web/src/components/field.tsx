/** A labelled input, and the message a failed request leaves on a form. */
import { useId, type InputHTMLAttributes } from 'react';
import { ApiError } from '../api/client.js';

export function Field({
  label,
  hint,
  ...input
}: { label: string; hint?: string } & InputHTMLAttributes<HTMLInputElement>) {
  const id = useId();
  return (
    <div className="mb-4">
      <label htmlFor={id} className="label">
        {label}
      </label>
      <input id={id} className="input" aria-describedby={hint ? `${id}-hint` : undefined} {...input} />
      {hint && (
        <p id={`${id}-hint`} className="muted mt-1 text-sm">
          {hint}
        </p>
      )}
    </div>
  );
}

/** Turns the server's error into one sentence; input errors list what zod said about each field. */
export function errorText(error: unknown): string {
  if (!(error instanceof ApiError)) return error instanceof Error ? error.message : 'Something went wrong.';
  if (error.code === 'invalid-input' && Array.isArray(error.details) && error.details.length > 0) {
    return (error.details as { message?: string }[])
      .map((d) => d.message)
      .filter(Boolean)
      .join(' ');
  }
  return error.message;
}

export function FormError({ error }: { error: unknown }) {
  if (!error) return null;
  return (
    <p role="alert" className="error-text mb-4 font-semibold">
      {errorText(error)}
    </p>
  );
}
