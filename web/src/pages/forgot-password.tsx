import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { useRequestReset } from '../queries/auth.js';
import { Field, FormError } from '../components/field.js';

export function ForgotPasswordPage() {
  const request = useRequestReset();
  const [email, setEmail] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    request.mutate(email);
  };
  return (
    <div className="mx-auto max-w-sm">
      <h1 className="mb-6">Forgotten password</h1>
      {request.isSuccess ? (
        // Worded the same whether or not the address has an account.
        <p role="status">
          If {email} has an account, a link to choose a new password is on its way. The link works once, for one hour.
        </p>
      ) : (
        <form onSubmit={submit}>
          <p className="mb-4">Enter your e-mail and we will send a link to choose a new password.</p>
          <FormError error={request.error} />
          <Field
            label="E-mail"
            type="email"
            autoComplete="email"
            required
            value={email}
            onChange={(e) => setEmail(e.target.value)}
          />
          <button type="submit" className="btn btn-primary w-full" disabled={request.isPending}>
            Send the link
          </button>
        </form>
      )}
      <p className="mt-4 text-sm">
        <Link className="link" to="/sign-in">
          Back to sign in
        </Link>
      </p>
    </div>
  );
}
