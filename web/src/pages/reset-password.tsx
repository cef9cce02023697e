import type { FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { ApiError } from '../api/client.js';
import { useResetPassword } from '../queries/auth.js';
import { FormError } from '../components/field.js';
import { useNewPassword } from '../components/new-password-fields.js';

/** Reached from a reset mail, or from an invitation (`invite=1`) where a new tester chooses a first password. */
export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const invite = params.get('invite') === '1';
  const reset = useResetPassword();
  const navigate = useNavigate();
  const fresh = useNewPassword();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (fresh.validate())
      reset.mutate({ token, password: fresh.password }, { onSuccess: () => navigate('/library', { replace: true }) });
  };
  const expired = reset.error instanceof ApiError && reset.error.code === 'invalid-token';
  return (
    <form onSubmit={submit} className="mx-auto max-w-sm">
      <h1 className="mb-6">{invite ? 'Choose your password' : 'Choose a new password'}</h1>
      {!token && <p role="alert">This page needs the link from the e-mail.</p>}
      {expired ? (
        <p role="alert" className="error-text mb-4 font-semibold">
          This link has been used or has expired.{' '}
          <Link className="link" to="/forgot-password">
            Ask for a new one
          </Link>
          .
        </p>
      ) : (
        <FormError error={fresh.problem ? new Error(fresh.problem) : reset.error} />
      )}
      {fresh.fields}
      <button type="submit" className="btn btn-primary w-full" disabled={!token || reset.isPending}>
        Save the password and sign in
      </button>
    </form>
  );
}
